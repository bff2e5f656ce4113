/**
 * The caution that every result carries, in every form (JSON field, CSV leading `#`
 * line, page, report). One wording, kept here.
 */
// No commas: the caution is a leading `#` line of every CSV result, and a comma would
// split it into several spreadsheet cells.
export const CAUTION =
  'Caution: these figures are computed from the offsets supplied and are for design and estimating only. ' +
  'They do not replace an approved stability book. Any decision on the safety of a vessel defers to the ' +
  "applicable classification society rules and the flag or local authority's regulations and to a qualified naval architect.";
