/**
 * CSV (formula) injection: a cell that begins with = + - @ TAB CR (or NUL) can run as a
 * formula when the file is opened in a spreadsheet. Export prefixes such cells with a
 * single quote, which spreadsheets treat as "this is text", and quotes the field.
 * Source: OWASP CSV Injection; OWASP ASVS 5.0 1.2.10; CWE-1236.
 */

const FORMULA_START = /^[=+\-@\t\r\0]/;
/** A formula start behind any number of apostrophes: these cells get one more ' on export. */
const ESCAPED_FORMULA_START = /^'*[=+\-@\t\r\0]/;

/** Whether a text cell would be read as a formula by a spreadsheet. */
export function startsLikeFormula(value: string): boolean {
  return FORMULA_START.test(value);
}

/**
 * Prefix a formula-like text cell with '. Text that already starts with apostrophes before
 * a formula character ("'=x") gets one more too, so that unneutraliseCell, which removes
 * exactly one, gives back the original text: export → import never changes a value.
 */
export function neutraliseCell(value: string): string {
  return ESCAPED_FORMULA_START.test(value) ? `'${value}` : value;
}

/**
 * The inverse, applied by the importer to every cell: strip exactly one leading ' when
 * what follows is (apostrophes and then) = + - @ TAB CR NUL. So a file we exported imports
 * back unchanged, and "'=x" typed by an editor is stored as the text "=x" — stored and
 * shown as text, never evaluated. A quote in front of anything else ("'t was") is kept.
 */
export function unneutraliseCell(value: string): string {
  return value.startsWith("'") && ESCAPED_FORMULA_START.test(value.slice(1)) ? value.slice(1) : value;
}
