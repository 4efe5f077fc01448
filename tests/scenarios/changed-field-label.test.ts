import { describe, expect, it } from 'vitest';
import { changedFieldLabel } from '../../src/lib/scenario-labels';

const doc = { options: [{ id: 'led-720', label: 'LED bar, 720 W' }, { id: 'hps-600', label: 'Owned sodium' }] };

describe('changedFieldLabel', () => {
  it('names scenario fields in words', () => {
    expect(changedFieldLabel(doc, 'electricity.pricePerKwh')).toBe('Electricity price, year 1');
    expect(changedFieldLabel(doc, 'cooling.cop')).toBe('Cooling COP');
  });

  it('names an option field by the option’s label (cut at a comma), found by id, and by the id when the option is gone', () => {
    expect(changedFieldLabel(doc, 'options[led-720].wallWatts')).toBe('LED bar: wall watts');
    expect(changedFieldLabel(doc, 'options[hps-600].lamp.price')).toBe('Owned sodium: lamp price');
    expect(changedFieldLabel(doc, 'options[cmh-315].fixturePrice')).toBe('cmh-315: fixture price');
  });

  it('gives back a path it has no words for', () => {
    expect(changedFieldLabel(doc, 'schedule')).toBe('schedule');
    expect(changedFieldLabel(undefined, 'options[x].somethingNew')).toBe('x: somethingNew');
  });
});
