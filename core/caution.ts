/**
 * The caution that every result carries, in every form (JSON field, CSV leading `#`
 * line, page, report). One wording, kept here.
 */
export const CAUTION =
  'Caution: these figures are computed from the offsets supplied and are for design and estimating only. ' +
  'They do not replace an approved stability book. Any decision on the safety of a vessel defers to the ' +
  "applicable classification society rules, the flag or local authority's regulations and a qualified naval architect.";
