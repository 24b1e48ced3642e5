import { defineRule } from '../define-rule';
import { fmt } from '../facts';

/** Widths within this many inches count as equal (catalog widths are rounded to fractions). Common practice (no source). */
const SAME_WIDTH_TOLERANCE_IN = 0.25;

/** Coil cabinet width against the furnace or air handler it sits on. */
export const coilCabinet = defineRule({
  id: 'fit.coil-cabinet',
  title: 'Coil fit to the cabinet',
  basis: { kind: 'common-practice', citation: 'Coil and furnace installation instructions (cabinet widths); an open gap lets air bypass the coil' },
  evaluate(pairing, _context, tools) {
    const coil = pairing.indoorCoil?.spec;
    const ah = pairing.airHandler?.spec;
    if (!coil || !ah) return [];
    const cabinet = ah.kind === 'furnace' ? 'furnace' : 'air handler';
    if (coil.widthIn === undefined || ah.widthIn === undefined) {
      const which = coil.widthIn === undefined && ah.widthIn === undefined ? `coil and ${cabinet} widths` : coil.widthIn === undefined ? 'coil width' : `${cabinet} width`;
      return [tools.missing(which, 'cabinet fit not checked')];
    }
    const diff = coil.widthIn - ah.widthIn;
    if (Math.abs(diff) <= SAME_WIDTH_TOLERANCE_IN) return [];
    const values = { coilWidthIn: coil.widthIn, cabinetWidthIn: ah.widthIn, differenceIn: Math.round(diff * 100) / 100 };
    if (diff > 0) {
      return [
        tools.finding({
          severity: 'blocker',
          title: `Coil is ${fmt(diff, 2)} in wider than the ${cabinet}`,
          detail: `Coil is ${fmt(coil.widthIn, 2)} in wide; the ${cabinet} is ${fmt(ah.widthIn, 2)} in: the coil overhangs the ${cabinet} by ${fmt(diff, 2)} in.`,
          fix: `Choose a coil ${fmt(ah.widthIn, 2)} in wide, or one the coil maker lists for this ${cabinet} width.`,
          values,
        }),
      ];
    }
    return [
      tools.finding({
        severity: 'caution',
        title: `Coil is ${fmt(-diff, 2)} in narrower than the ${cabinet}`,
        detail: `Coil is ${fmt(coil.widthIn, 2)} in wide; the ${cabinet} is ${fmt(ah.widthIn, 2)} in: ${fmt(-diff, 2)} in narrower.`,
        fix: `Fit a sheet-metal transition and seal it airtight so no air bypasses the coil, or choose a ${fmt(ah.widthIn, 2)} in coil.`,
        values,
      }),
    ];
  },
});
