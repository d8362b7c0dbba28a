/**
 * Rows of JSON with some keys written first. `{ ...extra, a, b, … }` would say the same, but V8
 * (Node 20) builds an object literal that starts with a spread and goes on with more fields slowly
 * (several microseconds for a row of a dozen fields), and batch rows are built by the hundred
 * thousand.
 */

/**
 * The row with the keys of `first` in front of its own, as `{ ...first, ...row }` would give it.
 *
 * @param first - keys to write first (a row's id, for example); often empty.
 * @param row - the row's own keys.
 * @returns `row` itself when `first` has no keys, else a new object with `first`'s keys and then `row`'s.
 * @example
 * keysFirst({ id: 'a' }, { input: 'H2O' }) // { id: 'a', input: 'H2O' }
 */
export function keysFirst<T extends object>(first: Record<string, unknown>, row: T): T & Record<string, unknown> {
  for (const _ in first) return Object.assign({}, first, row);
  return row as T & Record<string, unknown>;
}
