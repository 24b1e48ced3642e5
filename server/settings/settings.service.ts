import { DEFAULT_RULE_SETTINGS, resolveSettings } from '../../shared/rules/settings';
import type { RebateTierThresholds, RuleContext, RuleSettings, TransitionRule } from '../../shared/rules/types';
import type { ShopRebateTier } from '../../shared/schemas/options';
import type { RulesSettingsBody, RulesSettingsResponse } from '../../shared/schemas/settings';
import type { AppContext } from '../context';
import { withWriteLock } from '../db/write-transaction';
import { getShopSettings } from '../options/shop-settings.service';
import { RuleSettingsRow } from './rule-settings.entity';
import { cachedRulesSettings, forgetRulesSettings, settingsChanged } from './rules-settings-cache';
import { TransitionRuleRow } from './transition-rule.entity';

const SETTINGS_ROW_ID = 1;

/** The rule settings and transition rules checks run with (cached until a save on any instance). */
export function getRulesSettings(ctx: AppContext): Promise<RulesSettingsResponse> {
  return cachedRulesSettings(ctx, () => readRulesSettings(ctx));
}

/** The context the rules engine takes. */
export async function loadRuleContext(ctx: AppContext): Promise<RuleContext> {
  const { settings, transitionRules } = await getRulesSettings(ctx);
  return { settings, transitionRules };
}

/** Replaces the settings and the transition rules in one write-locked transaction (admin). */
export async function saveRulesSettings(ctx: AppContext, body: RulesSettingsBody, userId: number): Promise<RulesSettingsResponse> {
  // Drop the cache even on failure: a read during the transaction may have cached its uncommitted rows.
  await withWriteLock(ctx, async (manager) => {
    await manager.getRepository(RuleSettingsRow).save({
      id: SETTINGS_ROW_ID,
      settings: stripUndefined(body.settings),
      updatedAt: new Date().toISOString(),
      updatedBy: userId,
    });
    const rules = manager.getRepository(TransitionRuleRow);
    await rules.clear();
    if (body.transitionRules.length) await rules.insert(body.transitionRules.map(toRow));
    await settingsChanged(manager);
  }).finally(() => forgetRulesSettings(ctx));
  return getRulesSettings(ctx);
}

/** The shop's rebate tiers as the engine takes them (thresholds only; the shop's notes stay on Admin → Pricing). */
function engineTiers(tiers: ShopRebateTier[]): RebateTierThresholds[] {
  return tiers.map(({ name, seer2, eer2, hspf2 }) => stripUndefined({ name, seer2, eer2, hspf2 }));
}

async function readRulesSettings(ctx: AppContext): Promise<RulesSettingsResponse> {
  const row = await ctx.dataSource.getRepository(RuleSettingsRow).findOneBy({ id: SETTINGS_ROW_ID });
  const rules = await ctx.dataSource.getRepository(TransitionRuleRow).find({ order: { position: 'ASC' } });
  const shop = await getShopSettings(ctx);
  // A single tier stored before the shop list became the one source is moved by migration 1765430000000; never read it here.
  const { rebateTier: _legacy, rebateTiers: _stored, ...stored } = (row?.settings ?? {}) as RuleSettings & { rebateTier?: unknown };
  return {
    settings: { ...resolveSettings(stored), rebateTiers: engineTiers(shop.settings.rebateTiers) },
    transitionRules: rules.map(fromRow),
    defaults: DEFAULT_RULE_SETTINGS,
    updatedAt: row?.updatedAt ?? null,
  };
}

function toRow(rule: TransitionRule, position: number): TransitionRuleRow {
  return {
    id: rule.id,
    position,
    refrigerants: rule.refrigerants,
    scope: rule.scope,
    installFrom: rule.installFrom,
    manufacturedBefore: rule.manufacturedBefore ?? null,
    severity: rule.severity,
    citation: rule.citation,
    note: rule.note,
  };
}

function fromRow(row: TransitionRuleRow): TransitionRule {
  const rule: TransitionRule = {
    id: row.id,
    refrigerants: row.refrigerants,
    scope: row.scope,
    installFrom: row.installFrom,
    severity: row.severity,
    citation: row.citation,
    note: row.note,
  };
  if (row.manufacturedBefore) rule.manufacturedBefore = row.manufacturedBefore;
  return rule;
}

/** simple-json drops undefined anyway; this keeps the stored object equal to what comes back. */
function stripUndefined<T extends object>(value: T): T {
  return JSON.parse(JSON.stringify(value)) as T;
}
