import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MERGE_WINDOW_MS, UndoHistory } from '../../src/features/scenarios/hooks/undo-history';

// Pure client logic behind the editor's undo and redo (immer patches); no browser needed.
describe('UndoHistory', () => {
  const start = { title: 'Room', electricity: { pricePerKwh: '0.2' }, options: [{ id: 'a', wallWatts: 600 }] };

  it('takes back a change and puts it again', () => {
    const h = new UndoHistory(structuredClone(start));
    h.record({ ...structuredClone(start), electricity: { pricePerKwh: '0.02' } }, 0);
    expect(h.undo()).toEqual(start);
    expect(h.redo()?.electricity.pricePerKwh).toBe('0.02');
    expect(h.canRedo).toBe(false);
  });

  it('records nothing when nothing changed', () => {
    const h = new UndoHistory(structuredClone(start));
    expect(h.record(structuredClone(start), 0)).toBe(false);
    expect(h.canUndo).toBe(false);
  });

  it('merges keystrokes in one field into one step, but not edits far apart in time', () => {
    const h = new UndoHistory(structuredClone(start));
    h.record({ ...start, title: 'Roo' }, 0);
    h.record({ ...start, title: 'Ro' }, 100);
    h.record({ ...start, title: 'Room B' }, 200);
    h.record({ ...start, title: 'Room C' }, 200 + MERGE_WINDOW_MS + 1);
    expect(h.undo()?.title).toBe('Room B');
    expect(h.undo()?.title).toBe('Room');
    expect(h.canUndo).toBe(false);
  });

  it('handles added and removed list entries and removed fields', () => {
    const h = new UndoHistory(structuredClone(start));
    const two = { ...structuredClone(start), options: [{ id: 'a', wallWatts: 600 }, { id: 'b', wallWatts: 300 }] };
    h.record(two, 0);
    const one = { title: 'Room', options: [{ id: 'b', wallWatts: 300 }] } as unknown as typeof start;
    h.record(one, 5000);
    expect(h.value).toEqual(one);
    expect(h.undo()).toEqual(two);
    expect(h.undo()).toEqual(start);
  });

  it('walks back through any sequence of edits to every earlier state, and forward again', () => {
    const state = fc.record({ title: fc.string({ maxLength: 5 }), n: fc.integer(), list: fc.array(fc.integer(), { maxLength: 4 }) });
    fc.assert(
      fc.property(state, fc.array(state, { minLength: 1, maxLength: 8 }), (first, edits) => {
        const h = new UndoHistory(structuredClone(first));
        const seen = [first];
        edits.forEach((e, i) => {
          if (h.record(structuredClone(e), i * 10_000)) seen.push(e);
        });
        for (let i = seen.length - 2; i >= 0; i--) expect(h.undo()).toEqual(seen[i]);
        for (let i = 1; i < seen.length; i++) expect(h.redo()).toEqual(seen[i]);
      }),
    );
  });
});
