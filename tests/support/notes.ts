/**
 * The messages of a JSON row's notes, whether written as strings or as `{code, message}` objects
 * (the contract's form).
 */
export function noteMessages(row: { notes?: unknown }): string[] {
  const notes = (row.notes ?? []) as (string | { message: string })[];
  return notes.map((n) => (typeof n === 'string' ? n : n.message));
}

/** The codes of a JSON row's notes (empty strings for notes written without one). */
export function noteCodes(row: { notes?: unknown }): string[] {
  const notes = (row.notes ?? []) as (string | { code?: string })[];
  return notes.map((n) => (typeof n === 'string' ? '' : n.code ?? ''));
}
