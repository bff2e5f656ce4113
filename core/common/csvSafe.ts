/**
 * The one function that writes a text cell of any CSV we produce (the tables' comment
 * lines, text cells, the offsets file's name line), so that no spreadsheet can read a
 * formula out of it, whatever delimiter it splits the line on (a comma, a semicolon as
 * in locales with a decimal comma, a tab, a bar) and however it unquotes it.
 *
 * A spreadsheet evaluates a cell that begins with `=`, `+`, `-` or `@` (and some a
 * leading tab or carriage return before one). Every place where a cell could begin (the
 * start of the text, and after any `,` `;` `|` or `"`, with spaces between) that holds
 * such a character gets an apostrophe before it, which shows the rest as text; control
 * characters (tab and carriage return among them) and line or paragraph separators
 * become spaces, so they can neither start a cell nor a line. Numbers are written as
 * numbers by the CSV writers and never pass through here.
 * Source: OWASP, "CSV Injection" (owasp.org community page).
 *
 * @example csvSafeText('a,=1+2') // "a,'=1+2"
 * @example csvSafeText('x;\t"=cmd"') // `x; "'=cmd"`
 */
export function csvSafeText(text: string): string {
  return text.replace(/[\p{Cc}\p{Zl}\p{Zp}]/gu, ' ').replace(/(^|[,;|"])(\s*)(?=[=+\-@])/g, "$1$2'");
}
