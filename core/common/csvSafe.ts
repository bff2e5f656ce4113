/**
 * Text cells of CSV output are made safe to open in a spreadsheet: a cell that begins
 * with `=`, `+`, `-`, `@`, a tab or a carriage return could be read as a formula, so it
 * gets a leading apostrophe. Numbers are written as numbers and are never touched.
 * Source: OWASP, "CSV Injection" (owasp.org community page).
 */
export function csvSafeText(text: string): string {
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}
