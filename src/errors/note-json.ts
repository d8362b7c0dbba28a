/**
 * Notes as JSON rows carry them: the code and the message, without the column.
 */

/** A note in a JSON row. */
export interface NoteJson {
  code: string;
  message: string;
}

/**
 * Notes as JSON rows carry them: code and message.
 *
 * @param notes - the notes of a result.
 * @returns each note as `{code, message}`, in order.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * notesJson([{ code: 'STATE_SYMBOL', message: 'set aside', column: 4 }]) // [{ code: 'STATE_SYMBOL', message: 'set aside' }]
 */
export function notesJson(notes: readonly { code: string; message: string }[]): NoteJson[] {
  return notes.map((n) => ({ code: n.code, message: n.message }));
}
