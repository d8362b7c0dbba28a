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
