/**
 * Characters that make a spreadsheet read a typed text as a formula (or, for tab and carriage return,
 * that some programs strip before doing so), per OWASP's guidance on formula ("CSV") injection.
 */
const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * A user's text made safe to write into a spreadsheet cell: text that starts like a formula gets a
 * leading apostrophe, so no spreadsheet program runs it. `neutraliseFormula('=HYPERLINK("x")')` is
 * `'=HYPERLINK("x")`; "Pump 1" and "-" in the middle stay as they are.
 */
export function neutraliseFormula(text: string): string {
	return FORMULA_START.test(text) ? `'${text}` : text;
}
