/**
 * Notes as JSON rows carry them: the code and the message, without the column.
 */
import type { LibraryFunction } from './issue.js';
import { noteText } from './message.js';

/** A note in a JSON row. */
export interface NoteJson {
  code: string;
  message: string;
}

/**
 * Notes as JSON rows carry them: code and message, the options and functions a message names
 * named as {@link noteText} names them (the library's own words, or the command line's flags while
 * it writes its output).
 *
 * @param notes - the notes of a result.
 * @returns each note as `{code, message}`, in order.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * notesJson([{ code: 'STATE_SYMBOL', message: 'set aside', column: 4 }]) // [{ code: 'STATE_SYMBOL', message: 'set aside' }]
 */
export function notesJson(notes: readonly { code: string; message: string; options?: readonly string[]; functions?: readonly LibraryFunction[] }[]): NoteJson[] {
  return notes.map((n) => ({ code: n.code, message: noteText(n) }));
}
