import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { migrations } from '../../../server/db/migrations';
import { CARRIED_TIER_NOTE, RebateTiersOneList1765430000000 } from '../../../server/db/migrations/1765430000000-rebate-tiers-one-list';
import { forgetRulesSettings } from '../../../server/settings/rules-settings-cache';
import { sql } from '../../helpers/sql';
import { useTestApp } from '../../helpers/fixture-app';
import type { TestApp } from '../../helpers/test-app';

let t: TestApp;
useTestApp((app) => (t = app));

const settingsOf = async (table: 'rule_settings' | 'shop_settings') => {
  const rows = await sql<{ settings: string }>(t.ctx.dataSource, `SELECT "settings" FROM "${table}" WHERE "id" = 1`);
  return rows[0] ? (JSON.parse(rows[0].settings) as Record<string, unknown>) : null;
};
const putRow = (table: 'rule_settings' | 'shop_settings', settings: object) =>
  sql(t.ctx.dataSource, `INSERT INTO "${table}" ("id", "settings", "updatedAt", "updatedBy") VALUES (1, ?, ?, NULL)`, [
    JSON.stringify(settings),
    '2026-11-30T09:00:00.000Z',
  ]);
const clear = async () => {
  await sql(t.ctx.dataSource, 'DELETE FROM "rule_settings"');
  await sql(t.ctx.dataSource, 'DELETE FROM "shop_settings"');
};
// Undo the later migrations too, then this one (redo runs them all again).
const undo = async () => {
  for (let i = migrations.indexOf(RebateTiersOneList1765430000000); i < migrations.length; i++) await t.ctx.dataSource.undoLastMigration({ transaction: 'all' });
};
const redo = () => t.ctx.dataSource.runMigrations({ transaction: 'all' });

// Tier figures are invented shop thresholds (no source).
const single = { name: 'Utility tier', seer2: 16, eer2: 12 };

describe('migration 1765430000000 (rebate tiers: one list)', () => {
  it('when a single rule-settings tier exists and no shop settings were saved, then it moves into a new shop list, and undo/redo move it back and forth', async () => {
    await undo();
    await clear();
    await putRow('rule_settings', { cfmPerTonMin: 360, cfmPerTonMax: 440, rebateTier: single });
    await redo();
    expect(await settingsOf('rule_settings')).toEqual({ cfmPerTonMin: 360, cfmPerTonMax: 440 });
    expect(await settingsOf('shop_settings')).toEqual({ rebateTiers: [{ ...single, note: CARRIED_TIER_NOTE }] });
    forgetRulesSettings(t.ctx);
    const rules = await request(t.app)
      .get('/api/settings/rules')
      .set({ Authorization: `Bearer ${t.tokenFor('tech')}` })
      .expect(200);
    expect(rules.body.settings).toMatchObject({ cfmPerTonMin: 360, rebateTiers: [single] });

    await undo();
    expect(await settingsOf('rule_settings')).toEqual({ cfmPerTonMin: 360, cfmPerTonMax: 440, rebateTier: single });
    expect(await settingsOf('shop_settings')).toEqual({ rebateTiers: [] });
    await redo();
    expect(await settingsOf('shop_settings')).toEqual({ rebateTiers: [{ ...single, note: CARRIED_TIER_NOTE }] });
  });

  it('when the shop list already has a tier of that name, then it is not added twice, and the rest of the shop settings stay', async () => {
    await undo();
    await clear();
    await putRow('rule_settings', { rebateTier: single });
    await putRow('shop_settings', { laborRateCents: 11000, rebateTiers: [{ name: 'Utility tier', seer2: 16.5 }] });
    await redo();
    expect(await settingsOf('rule_settings')).toEqual({});
    expect(await settingsOf('shop_settings')).toEqual({ laborRateCents: 11000, rebateTiers: [{ name: 'Utility tier', seer2: 16.5 }] });
  });

  it('when no single tier was stored, then nothing changes', async () => {
    await undo();
    await clear();
    await putRow('rule_settings', { cfmPerTonMin: 370, cfmPerTonMax: 450 });
    await redo();
    expect(await settingsOf('rule_settings')).toEqual({ cfmPerTonMin: 370, cfmPerTonMax: 450 });
    expect(await settingsOf('shop_settings')).toBeNull();
  });
});
