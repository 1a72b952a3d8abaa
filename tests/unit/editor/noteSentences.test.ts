import { describe, expect, it } from 'vitest';
import { noteSentences } from '../../../src/editor/noteSentences.ts';

describe('noteSentences', () => {
  it('joins a sentence and a phrase without a doubled stop, the phrase made a sentence', () => {
    expect(noteSentences(['Glue up from 5 boards; grain side to side.', 'rough width allows for jointing 5 boards']))
      .toBe('Glue up from 5 boards; grain side to side. Rough width allows for jointing 5 boards.');
  });

  it('keeps a note that already ends in a stop or a question as it is, and drops empty notes', () => {
    expect(noteSentences(['Floats in its grooves: no glue.', '  ', 'Check the grain?'])).toBe('Floats in its grooves: no glue. Check the grain?');
  });

  it('gives nothing for no notes', () => {
    expect(noteSentences([])).toBe('');
  });
});
