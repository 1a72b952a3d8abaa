/** A part's notes (the engine's short phrases and sentences) as one line of sentences. */

/** Joins `notes` as sentences: each starts with a capital and ends with a stop, none doubled. */
export function noteSentences(notes: readonly string[]): string {
  return notes
    .map((note) => note.trim())
    .filter((note) => note.length > 0)
    .map((note) => {
      const capital = note[0]!.toUpperCase() + note.slice(1);
      return /[.!?:]$/.test(capital) ? capital : `${capital}.`;
    })
    .join(' ');
}
