/**
 * A table of texts by small whole number (row ends, number texts, percents), made once a run has
 * asked for {@link LazyTexts.after} of them: a batch finds most of its texts there, and a command
 * writing a few rows never allocates the table (tens of kilobytes each, which start-up paid for).
 */
export class LazyTexts {
  private table: (string | undefined)[] | undefined;
  private asked = 0;

  /**
   * @param size - the table's slots (keys 0 to size − 1).
   * @param after - how many look-ups are answered without a table before it is made.
   * @example
   * new LazyTexts(4096).get(12) // undefined (nothing kept yet)
   */
  constructor(
    readonly size: number,
    readonly after = 64,
  ) {}

  /**
   * The text kept for key k, or undefined (always, until the table is made).
   *
   * @example
   * const t = new LazyTexts(8, 0);
   * t.get(3) // undefined (this look-up makes the table)
   * t.keep(3, 'three');
   * t.get(3) // 'three'
   */
  get(k: number): string | undefined {
    const table = this.table;
    if (table !== undefined) return table[k];
    if (++this.asked > this.after) this.table = new Array<string | undefined>(this.size).fill(undefined);
    return undefined;
  }

  /**
   * Keeps `text` for key k (once the table is made; k must be a whole number below size) and
   * returns it.
   *
   * @example
   * new LazyTexts(8).keep(2, 'two') // 'two'
   */
  keep(k: number, text: string): string {
    if (this.table !== undefined) this.table[k] = text;
    return text;
  }
}
