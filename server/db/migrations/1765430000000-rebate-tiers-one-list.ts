import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The note a carried tier gets, so the shop sees where it came from and `down` can find it again. */
export const CARRIED_TIER_NOTE = 'Carried over from the single tier of the rule settings.';

interface Tier {
  name: string;
  seer2?: number;
  eer2?: number;
  hspf2?: number;
  note?: string;
}
type Settings = Record<string, unknown>;

/** Placeholder n (1-based) in the running database's spelling. */
const param = (queryRunner: QueryRunner, n: number) => (queryRunner.connection.driver.options.type === 'postgres' ? `$${n}` : '?');

async function readSettings(queryRunner: QueryRunner, table: 'rule_settings' | 'shop_settings'): Promise<Settings | null> {
  const rows = (await queryRunner.query(`SELECT "settings" FROM "${table}" WHERE "id" = 1`)) as { settings: string }[];
  return rows[0] ? (JSON.parse(rows[0].settings) as Settings) : null;
}

async function writeSettings(
  queryRunner: QueryRunner,
  table: 'rule_settings' | 'shop_settings',
  settings: Settings,
  exists: boolean,
): Promise<void> {
  const p = (n: number) => param(queryRunner, n);
  const json = JSON.stringify(settings);
  if (exists) await queryRunner.query(`UPDATE "${table}" SET "settings" = ${p(1)} WHERE "id" = 1`, [json]);
  else
    await queryRunner.query(`INSERT INTO "${table}" ("id", "settings", "updatedAt", "updatedBy") VALUES (1, ${p(1)}, ${p(2)}, NULL)`, [
      json,
      new Date().toISOString(),
    ]);
}

/**
 * Rebate tiers had two homes: a list in the shop settings (Admin → Pricing, used by the options) and a single
 * tier in the rule settings (used by the engine). The list is now the only one: a single tier stored in the
 * rule settings is appended to it (unless a tier of that name is there already) and removed from the rule settings.
 * A shop with no saved shop settings gets a row holding just that list (the other fields stay on the defaults).
 */
export class RebateTiersOneList1765430000000 implements MigrationInterface {
  name = 'RebateTiersOneList1765430000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const rules = await readSettings(queryRunner, 'rule_settings');
    const tier = rules?.rebateTier as Tier | undefined;
    if (!rules || !tier) return;
    const shop = await readSettings(queryRunner, 'shop_settings');
    const list = (shop?.rebateTiers as Tier[] | undefined) ?? [];
    if (!list.some((t) => t.name === tier.name)) {
      const { name, seer2, eer2, hspf2 } = tier;
      await writeSettings(
        queryRunner,
        'shop_settings',
        { ...shop, rebateTiers: [...list, { name, seer2, eer2, hspf2, note: CARRIED_TIER_NOTE }] },
        shop !== null,
      );
    }
    const { rebateTier: _moved, ...rest } = rules;
    await writeSettings(queryRunner, 'rule_settings', rest, true);
  }

  /** Puts a carried tier back into the rule settings and takes it out of the list. */
  async down(queryRunner: QueryRunner): Promise<void> {
    const shop = await readSettings(queryRunner, 'shop_settings');
    const list = (shop?.rebateTiers as Tier[] | undefined) ?? [];
    const carried = list.find((t) => t.note === CARRIED_TIER_NOTE);
    const rules = await readSettings(queryRunner, 'rule_settings');
    if (!shop || !carried || !rules) return;
    const { note: _note, ...tier } = carried;
    await writeSettings(queryRunner, 'rule_settings', { ...rules, rebateTier: tier }, true);
    await writeSettings(queryRunner, 'shop_settings', { ...shop, rebateTiers: list.filter((t) => t !== carried) }, true);
  }
}
