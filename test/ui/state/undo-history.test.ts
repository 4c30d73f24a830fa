import { describe, expect, test } from 'vitest';
import { UndoHistory } from '../../../src/ui/state/undo-history.ts';

describe('UndoHistory', () => {
  test('undo and redo walk back and forth through recorded states', () => {
    const history = new UndoHistory('a');
    history.record('b', null, 0);
    history.record('c', null, 10);
    expect(history.undo()).toBe('b');
    expect(history.undo()).toBe('a');
    expect(history.undo()).toBeNull();
    expect(history.redo()).toBe('b');
    expect(history.redo()).toBe('c');
    expect(history.redo()).toBeNull();
  });

  test('changes to one field in quick succession make one step', () => {
    const history = new UndoHistory('', { mergeWindow: 1000 });
    history.record('1', 'baseline', 0);
    history.record('15', 'baseline', 300);
    history.record('15%', 'baseline', 600);
    expect(history.undo()).toBe('');
    expect(history.canUndo).toBe(false);
  });

  test('a pause, or another field, starts a new step', () => {
    const history = new UndoHistory('', { mergeWindow: 1000 });
    history.record('1', 'baseline', 0);
    history.record('15', 'baseline', 2000);
    history.record('15 x', 'title', 2100);
    expect(history.undo()).toBe('15');
    expect(history.undo()).toBe('1');
    expect(history.undo()).toBe('');
  });

  test('a change after undo drops the steps that could have been redone', () => {
    const history = new UndoHistory(1);
    history.record(2, null, 0);
    history.undo();
    history.record(3, null, 5);
    expect(history.canRedo).toBe(false);
    expect(history.undo()).toBe(1);
  });

  test('keeps at most the limit of steps back', () => {
    const history = new UndoHistory(0, { limit: 3 });
    for (let value = 1; value <= 5; value += 1) history.record(value, null, value * 5000);
    const seen: number[] = [];
    for (let step = history.undo(); step !== null; step = history.undo()) seen.push(step);
    expect(seen).toEqual([4, 3, 2]);
  });
});
