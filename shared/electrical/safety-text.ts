// Source: DESIGN §7 — electrical texts carry the usual cautions and defer to local code and the AHJ.
/** The caution every electrical fix carries (DESIGN §7). */
export const ELECTRICAL_SAFETY =
  'Electrical work by a licensed electrician only, with the circuit locked out; the NEC and local code (the AHJ) decide.';
