import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { changedPaths } from '../../server/services/scenarios/changed-paths';
import { displayValue, fieldChanges, parsePath, valueAtPath } from '../../src/features/scenarios/lib/document-paths';

const doc = { title: 'Room', electricity: { pricePerKwh: '0.2' }, options: [{ id: 'a', wallWatts: 630 }, { id: 'b', wallWatts: 1000, tags: ['x'] }] };

describe('reading a revision’s fields by path', () => {
  it('splits paths written as problems and changes write them', () => {
    expect(parsePath('options[1].wallWatts')).toEqual(['options', 1, 'wallWatts']);
    expect(parsePath('title')).toEqual(['title']);
    expect(parsePath('options[3]')).toEqual(['options', 3]);
  });

  it('finds values, and nothing past a missing step', () => {
    expect(valueAtPath(doc, 'electricity.pricePerKwh')).toBe('0.2');
    expect(valueAtPath(doc, 'options[1].wallWatts')).toBe(1000);
    expect(valueAtPath(doc, 'options[2].wallWatts')).toBeUndefined();
    expect(valueAtPath(doc, 'title.length.x')).toBeUndefined();
  });

  it('writes each kind of value as one line', () => {
    expect(displayValue(undefined)).toBe('(not set)');
    expect(displayValue(null)).toBe('(empty)');
    expect(displayValue('')).toBe('(blank)');
    expect(displayValue(0.02)).toBe('0.02');
    expect(displayValue({ id: 'b' })).toBe('{"id":"b"}');
    expect(displayValue('x'.repeat(300))).toBe('x'.repeat(300));
    expect(displayValue(['y'.repeat(300)])).toHaveLength(120);
  });

  it('gives before and after for an added option and a changed price', () => {
    const after = { ...doc, electricity: { pricePerKwh: '0.02' }, options: [...doc.options, { id: 'c', wallWatts: 480 }] };
    expect(fieldChanges(doc, after, changedPaths(doc, after))).toEqual([
      { path: 'electricity.pricePerKwh', before: '0.2', after: '0.02' },
      { path: 'options[2]', before: '(not set)', after: '{"id":"c","wallWatts":480}' },
    ]);
  });

  it('reads a different value on each side of every path the server reports as changed (property)', () => {
    // Field names as the scenario format has them (letters and digits); values of every JSON kind, nested.
    const key = fc.stringMatching(/^[a-z][a-zA-Z0-9]{0,4}$/);
    const { node } = fc.letrec<{ node: unknown }>((tie) => ({
      node: fc.oneof({ depthSize: 'small' }, fc.string(), fc.integer(), fc.boolean(), fc.constant(null), fc.array(tie('node'), { maxLength: 3 }), fc.dictionary(key, tie('node'), { maxKeys: 3 })),
    }));
    fc.assert(
      fc.property(fc.dictionary(key, node, { maxKeys: 4 }), fc.dictionary(key, node, { maxKeys: 4 }), (before, after) => {
        for (const path of changedPaths(before, after)) {
          expect(JSON.stringify(valueAtPath(before, path))).not.toBe(JSON.stringify(valueAtPath(after, path)));
        }
      }),
      { numRuns: 300 },
    );
  });
});
