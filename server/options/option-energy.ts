import { compareSeason } from '../../shared/estimates/annual-energy';
import { estimateExistingEfficiency } from '../../shared/estimates/existing-efficiency';
import { formatDollars } from '../../shared/estimates/money';
import { paybackText, simplePaybackYears } from '../../shared/estimates/payback';
import { NO_RATED_SEER2, type EnergyComparison, type EnergyLeg, type EnergyQuery, type ShopSettings } from '../../shared/schemas/options';

/** Age assumed when neither the existing figures nor its age are given. */
const DEFAULT_AGE_YEARS = 15;

/** The option's annual energy and cost against the existing system, with every assumption in words. */
export function energyComparison(
  figures: { seer2?: number; hspf2?: number; coolingBtuh: number },
  heatPump: boolean,
  priceCents: number,
  query: EnergyQuery,
  settings: ShopSettings,
  asOfYear = new Date().getUTCFullYear(),
): EnergyComparison {
  const coolingHours = query.coolingHours ?? settings.coolingHoursPerYear;
  const heatingHours = query.heatingHours ?? settings.heatingHoursPerYear;
  const centsPerKwh = query.centsPerKwh ?? settings.centsPerKwh;
  const existingHeatPump = query.existingHeatPump ?? heatPump;
  const assumptions = [
    `Cooling ${coolingHours.toLocaleString('en-US')} full-load hours a year${heatPump && existingHeatPump ? `, heating ${heatingHours.toLocaleString('en-US')}` : ''}, electricity ${centsPerKwh} ¢/kWh.`,
    `Capacity ${figures.coolingBtuh.toLocaleString('en-US')} Btu/h for both systems; kWh = Btu/h × hours ÷ (SEER2 or HSPF2 × 1000).`,
  ];
  const age = query.existingAgeYears;
  const estimate = estimateExistingEfficiency(age ?? DEFAULT_AGE_YEARS, asOfYear, existingHeatPump);
  let basis: EnergyComparison['existing']['basis'] = 'given';
  if (query.existingSeer2 === undefined || (existingHeatPump && query.existingHspf2 === undefined)) {
    basis = age === undefined ? 'assumed-default' : 'estimated-from-age';
    assumptions.push(
      age === undefined
        ? `No existing figures or age given: assumed ${DEFAULT_AGE_YEARS} years old. ${estimate.assumption}`
        : estimate.assumption,
    );
  }
  const existingSeer2 = query.existingSeer2 ?? estimate.seer2;
  const existingHspf2 = query.existingHspf2 ?? estimate.hspf2;
  let cooling: EnergyLeg | null = null;
  if (figures.seer2 !== undefined)
    cooling = compareSeason('cooling', figures.coolingBtuh, coolingHours, existingSeer2, figures.seer2, centsPerKwh);
  else assumptions.push(`The yearly cooling cost and the payback are not worked out: ${NO_RATED_SEER2}.`);
  let heating: EnergyComparison['heating'];
  if (heatPump && existingHeatPump) {
    if (figures.hspf2 !== undefined)
      heating = compareSeason('heating', figures.coolingBtuh, heatingHours, existingHspf2, figures.hspf2, centsPerKwh);
    else assumptions.push('The new HSPF2 is not known: no heating saving is counted.');
    assumptions.push('Heating load approximated by the rated cooling capacity (no heat-loss calculation; backup heat not counted).');
  }
  const existing = { seer2: existingSeer2, ...(existingHeatPump ? { hspf2: existingHspf2 } : {}), basis };
  if (!cooling) {
    // Without the cooling leg any saving (and so any payback) would be a guess: say why instead of a zero.
    const paybackWords = `Payback not worked out: ${NO_RATED_SEER2}.`;
    return {
      cooling: null,
      ...(heating ? { heating } : {}),
      annualSavingCents: null,
      paybackYears: null,
      paybackText: paybackWords,
      notComputed: NO_RATED_SEER2,
      existing,
      assumptions,
    };
  }
  const annualSavingCents = cooling.savingCents + (heating?.savingCents ?? 0);
  assumptions.push(`Annual saving ${formatDollars(annualSavingCents)}; simple payback = price ÷ annual saving, no discounting.`);
  return {
    cooling,
    ...(heating ? { heating } : {}),
    annualSavingCents,
    paybackYears: simplePaybackYears(priceCents, annualSavingCents),
    paybackText: paybackText(priceCents, annualSavingCents),
    existing,
    assumptions,
  };
}
