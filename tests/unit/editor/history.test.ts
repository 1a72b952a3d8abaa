import { describe, expect, it } from 'vitest';
import { HISTORY_LIMIT, record, redo, seal, startHistory, undo } from '../../../src/editor/history.ts';

describe('record', () => {
  it('merges successive changes to one field into one step', () => {
    let h = startHistory({ width: 40 });
    h = record(h, { width: 41 }, 'width');
    h = record(h, { width: 41.5 }, 'width');
    expect(h.past).toEqual([{ width: 40 }]);
    expect(undo(h).present).toEqual({ width: 40 });
  });

  it('starts a new step after the field is sealed or another field changes', () => {
    let h = startHistory({ width: 40, depth: 19 });
    h = record(h, { width: 41, depth: 19 }, 'width');
    h = seal(h);
    h = record(h, { width: 42, depth: 19 }, 'width');
    h = record(h, { width: 42, depth: 20 }, 'depth');
    expect(h.past).toHaveLength(3);
  });

  it('never merges changes recorded without a key', () => {
    let h = startHistory(1);
    h = record(h, 2, null);
    h = record(h, 3, null);
    expect(h.past).toEqual([1, 2]);
  });

  it('drops the redo future when a new change is made', () => {
    let h = startHistory(1);
    h = record(h, 2, null);
    h = undo(h);
    h = record(h, 5, null);
    expect(h.future).toEqual([]);
    expect(redo(h).present).toBe(5);
  });

  it('keeps at most the step limit', () => {
    let h = startHistory(0);
    for (let i = 1; i <= HISTORY_LIMIT + 10; i++) h = record(h, i, null);
    expect(h.past).toHaveLength(HISTORY_LIMIT);
    expect(h.past[0]).toBe(10);
  });
});

describe('undo and redo', () => {
  it('walk back and forward through the steps', () => {
    let h = startHistory('a');
    h = record(h, 'b', null);
    h = record(h, 'c', null);
    h = undo(undo(h));
    expect(h.present).toBe('a');
    h = redo(h);
    expect(h.present).toBe('b');
    expect(h.future).toEqual(['c']);
  });

  it('leave the history unchanged at either end', () => {
    const h = startHistory('only');
    expect(undo(h)).toBe(h);
    expect(redo(h)).toBe(h);
  });

  it('close the open step so typing after an undo is a new step', () => {
    let h = startHistory(1);
    h = record(h, 2, 'width');
    h = record(h, 3, 'width');
    h = undo(h);
    h = record(h, 4, 'width');
    expect(h.past).toEqual([1]);
    expect(undo(h).present).toBe(1);
  });
});
