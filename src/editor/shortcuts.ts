/** Keyboard shortcuts for undo and redo, as every desktop editor binds them. */

/** The parts of a keyboard event the shortcuts read. */
export interface KeyChord {
  key: string;
  ctrlKey: boolean;
  metaKey: boolean;
  shiftKey: boolean;
  altKey: boolean;
}

/** `undo` for Ctrl+Z (⌘Z), `redo` for Ctrl+Shift+Z, Ctrl+Y (⌘⇧Z), otherwise null. */
export function historyShortcut(chord: KeyChord): 'undo' | 'redo' | null {
  if (chord.altKey || !(chord.ctrlKey || chord.metaKey)) return null;
  const key = chord.key.toLowerCase();
  if (key === 'z') return chord.shiftKey ? 'redo' : 'undo';
  if (key === 'y' && !chord.shiftKey) return 'redo';
  return null;
}
