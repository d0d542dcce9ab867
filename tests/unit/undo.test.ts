import { describe, expect, it } from 'vitest';
import { canRedo, canUndo, createHistory, HISTORY_LIMIT, push, redo, replacePresent, undo } from '@/lib/undo';

/* The composer's undo history (lib/undo.ts): plain values stand in for recipe trees. */

describe('push', () => {
  it('makes the old present undoable and the new one current', () => {
    const h = push(push(createHistory('a'), 'b'), 'c');
    expect(h.present).toBe('c');
    expect(h.past).toEqual(['a', 'b']);
    expect(canUndo(h)).toBe(true);
    expect(canRedo(h)).toBe(false);
  });

  it('ignores the same value pushed again', () => {
    const h = push(createHistory('a'), 'b');
    expect(push(h, 'b')).toBe(h);
  });

  it('never mutates the history it was given', () => {
    const h = createHistory('a');
    const frozen = Object.freeze({ ...h, past: Object.freeze([...h.past]), future: Object.freeze([...h.future]) });
    expect(() => redo(undo(push(frozen, 'b')))).not.toThrow();
    expect(frozen.present).toBe('a');
  });
});

describe('undo and redo', () => {
  it('walk back and forth through the values', () => {
    let h = push(push(createHistory(1), 2), 3);
    h = undo(h);
    expect(h.present).toBe(2);
    h = undo(h);
    expect(h.present).toBe(1);
    expect(canUndo(h)).toBe(false);
    expect(h.future).toEqual([2, 3]);
    h = redo(h);
    expect(h.present).toBe(2);
    h = redo(h);
    expect(h.present).toBe(3);
    expect(canRedo(h)).toBe(false);
  });

  it('do nothing at either end', () => {
    const start = createHistory('only');
    expect(undo(start)).toBe(start);
    expect(redo(start)).toBe(start);
  });
});

describe('branching', () => {
  it('drops the redo stack when a new value is pushed after an undo', () => {
    let h = push(push(createHistory('a'), 'b'), 'c');
    h = undo(undo(h));
    expect(canRedo(h)).toBe(true);
    h = push(h, 'x');
    expect(h.present).toBe('x');
    expect(h.future).toEqual([]);
    expect(redo(h)).toBe(h);
    expect(undo(h).present).toBe('a');
  });
});

describe('limit', () => {
  it('keeps at most 200 undo steps, dropping the oldest', () => {
    expect(HISTORY_LIMIT).toBe(200);
    let h = createHistory(0);
    for (let i = 1; i <= 250; i++) h = push(h, i);
    expect(h.past).toHaveLength(200);
    expect(h.past[0]).toBe(50);
    for (let i = 0; i < 300; i++) h = undo(h);
    expect(h.present).toBe(50);
  });

  it('honours a smaller limit, down to none', () => {
    const three = [1, 2, 3, 4, 5].reduce((h, v) => push(h, v), createHistory(0, 3));
    expect(three.past).toEqual([2, 3, 4]);
    const none = push(createHistory('a', 0), 'b');
    expect(none.past).toEqual([]);
    expect(canUndo(none)).toBe(false);
  });
});

describe('replacePresent', () => {
  it('swaps the present without an undo step and keeps both stacks', () => {
    const h = undo(push(push(createHistory('a'), 'b'), 'c'));
    const swapped = replacePresent(h, 'B');
    expect(swapped.present).toBe('B');
    expect(swapped.past).toEqual(['a']);
    expect(swapped.future).toEqual(['c']);
  });
});
