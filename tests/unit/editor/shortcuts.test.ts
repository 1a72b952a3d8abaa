import { describe, expect, it } from 'vitest';
import { historyShortcut, type KeyChord } from '../../../src/editor/shortcuts.ts';

const chord = (key: string, mods: Partial<KeyChord> = {}): KeyChord => ({ key, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...mods });

describe('historyShortcut', () => {
  it('undoes on Ctrl+Z and Cmd+Z', () => {
    expect(historyShortcut(chord('z', { ctrlKey: true }))).toBe('undo');
    expect(historyShortcut(chord('z', { metaKey: true }))).toBe('undo');
  });

  it('redoes on Ctrl+Shift+Z and Ctrl+Y', () => {
    expect(historyShortcut(chord('Z', { ctrlKey: true, shiftKey: true }))).toBe('redo');
    expect(historyShortcut(chord('y', { ctrlKey: true }))).toBe('redo');
  });

  it('ignores the letters alone and with Alt', () => {
    expect(historyShortcut(chord('z'))).toBeNull();
    expect(historyShortcut(chord('z', { ctrlKey: true, altKey: true }))).toBeNull();
    expect(historyShortcut(chord('y', { ctrlKey: true, shiftKey: true }))).toBeNull();
  });
});
