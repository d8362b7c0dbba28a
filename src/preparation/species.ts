/**
 * How prose and labels name a species the user gave: as written, normalised (trimmed, runs of
 * white space as one space), never in Hill order ('PO4', not 'O4P'; 'CuCl2', not 'Cl2Cu'). The
 * Hill formula stays a field of its own in each result.
 */

/**
 * The species as the user wrote it, normalised.
 *
 * @param detail - anything with the text as given (a formula's mass detail, a species).
 * @returns the trimmed text with runs of white space as one space.
 * @example
 * speciesText({ input: '  CuCl2 ' }) // 'CuCl2'
 * speciesText({ input: 'CaCl2 · 2H2O' }) // 'CaCl2 · 2H2O'
 */
export function speciesText(detail: { readonly input: string }): string {
  return detail.input.trim().replace(/\s+/g, ' ');
}

/**
 * The Hill formula to show beside a species in a heading, with its separator: only for a formula
 * with carbon that is written otherwise (an abbreviation, another order), because for organic
 * formulas Hill order is the conventional written form; an inorganic species is named as written
 * alone ('CuCl2', never 'CuCl2 (Cl2Cu)').
 *
 * @param detail - the species' input text, Hill formula and atoms.
 * @returns 'C72H60P4Pd, ' or ''.
 * @example
 * hillAside({ input: 'CuCl2', formula: 'Cl2Cu', atoms: new Map([['Cu', 1], ['Cl', 2]]) }) // ''
 * hillAside({ input: 'Pd(PPh3)4', formula: 'C72H60P4Pd', atoms: new Map([['Pd', 1], ['P', 4], ['C', 72], ['H', 60]]) }) // 'C72H60P4Pd, '
 */
export function hillAside(detail: { readonly input: string; readonly formula: string; readonly atoms: ReadonlyMap<string, unknown> }): string {
  const organic = [...detail.atoms.keys()].some((k) => /^[0-9]*C$/.test(k));
  return organic && detail.formula !== speciesText(detail) ? `${detail.formula}, ` : '';
}
