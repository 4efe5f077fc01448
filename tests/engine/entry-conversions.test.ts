import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { canopyArea, convertOutput, convertTarget, switchEntry, efficacyFromPpf, litHoursPerYear, photonEfficacyOf, ppfFromEfficacy, shedFloatNoise } from '../../src/engine';
import type { TargetMode } from '../../src/engine';

/** Decimal figures a person types: up to 6 significant digits. */
const typed = (min: number, max: number) =>
  fc.tuple(fc.integer({ min: 1, max: 999_999 }), fc.integer({ min: 0, max: 5 }))
    .map(([digits, decimals]) => digits / 10 ** decimals)
    .filter((v) => v >= min && v <= max);
const photoperiod = fc.tuple(fc.integer({ min: 1, max: 24 }), fc.constantFrom(0, 0.25, 0.5, 0.75))
  .map(([h, q]) => h + q)
  .filter((h) => h <= 24);

describe('convertTarget', () => {
  // DLI = PPFD × hours × 3600 / 10⁶: Purdue Extension HO-238-W (Torres & Lopez, Measuring Daily Light
  // Integral in a Greenhouse, 2010) gives 200 µmol m⁻² s⁻¹ over 16 h as 11.52 mol m⁻² d⁻¹.
  it('turns 200 µmol m⁻² s⁻¹ over 16 h into 11.52 mol m⁻² d⁻¹ and back (Purdue HO-238-W)', () => {
    expect(convertTarget(200, 'ppfd', 16)).toBe(11.52);
    expect(convertTarget(11.52, 'dli', 16)).toBe(200);
  });

  it('keeps 295.14 µmol m⁻² s⁻¹ through a switch to DLI and back at 18 h (19.125072 mol m⁻² d⁻¹ in between)', () => {
    const dli = convertTarget(295.14, 'ppfd', 18);
    expect(dli).toBe(19.125072);
    expect(convertTarget(dli, 'dli', 18)).toBe(295.14);
  });

  it('keeps a DLI of 17 through a switch to PPFD and back at 18 h', () => {
    const ppfd = convertTarget(17, 'dli', 18);
    expect(ppfd).toBeCloseTo(17e6 / (18 * 3600), 9);
    expect(convertTarget(ppfd, 'ppfd', 18)).toBe(17);
  });

  it('gives back any typed PPFD after a switch to DLI and back, at any photoperiod', () => {
    fc.assert(fc.property(typed(0.001, 3000), photoperiod, (ppfd, h) => convertTarget(convertTarget(ppfd, 'ppfd', h), 'dli', h) === ppfd));
  });

  it('comes back within 1e-11 of any typed DLI after a conversion to PPFD and back (the PPFD may repeat)', () => {
    fc.assert(fc.property(typed(0.001, 100), photoperiod, (dli, h) => Math.abs(convertTarget(convertTarget(dli, 'dli', h), 'ppfd', h) - dli) <= 1e-11 * dli));
  });
});

describe('switchEntry', () => {
  const modes = fc.constantFrom<TargetMode>('ppfd', 'dli');
  const other = (m: TargetMode): TargetMode => (m === 'ppfd' ? 'dli' : 'ppfd');

  it('gives back 37.2688 mol m⁻² d⁻¹ at 7.25 h exactly after a switch to PPFD and back, where converting alone does not', () => {
    expect(convertTarget(convertTarget(37.2688, 'dli', 7.25), 'ppfd', 7.25)).not.toBe(37.2688);
    const there = switchEntry(37.2688, 'dli', 7.25, convertTarget);
    const back = switchEntry(there.converted, 'ppfd', 7.25, convertTarget, there);
    expect(back.converted).toBe(37.2688);
  });

  it('gives back any typed value exactly after any number of switches to and fro', () => {
    fc.assert(
      fc.property(typed(0.001, 3000), photoperiod, modes, fc.integer({ min: 1, max: 6 }), (v, h, start, pairs) => {
        let s = switchEntry(v, start, h, convertTarget);
        for (let i = 1; i < 2 * pairs; i++) s = switchEntry(s.converted, i % 2 === 1 ? other(start) : start, h, convertTarget, s);
        return s.converted === v;
      }),
    );
  });

  it('converts afresh when the value was edited after the switch', () => {
    const there = switchEntry(295.14, 'ppfd', 18, convertTarget);
    expect(switchEntry(20, 'dli', 18, convertTarget, there).converted).toBe(convertTarget(20, 'dli', 18));
  });

  it('converts afresh when the photoperiod changed after the switch', () => {
    const there = switchEntry(295.14, 'ppfd', 18, convertTarget);
    expect(switchEntry(there.converted, 'dli', 12, convertTarget, there).converted).toBe(convertTarget(there.converted, 'dli', 12));
  });

  it('gives back a typed PPF of 1000 µmol/s at 630 W after a switch to efficacy and back', () => {
    const there = switchEntry(1000, 'ppf', 630, convertOutput);
    expect(there.converted).toBe(1.58730158730);
    expect(switchEntry(there.converted, 'efficacy', 630, convertOutput, there).converted).toBe(1000);
  });
});

describe('fixture output conversions', () => {
  it('gives PPF = efficacy × wall power: 2.7 µmol/J at 660 W is 1782 µmol/s', () => {
    expect(ppfFromEfficacy(2.7, 660)).toBe(1782);
  });

  it('gives efficacy = PPF ÷ wall power: 1050 µmol/s at 420 W is 2.5 µmol/J', () => {
    expect(efficacyFromPpf(1050, 420)).toBe(2.5);
  });

  it('gives back any typed efficacy after a switch to PPF and back', () => {
    fc.assert(fc.property(typed(0.01, 4.5), fc.integer({ min: 1, max: 2000 }), (eff, w) => efficacyFromPpf(ppfFromEfficacy(eff, w), w) === eff));
  });

  it('reads a fixture efficacy as given, or from PPF and wall power, or none', () => {
    expect(photonEfficacyOf({ wallWatts: 640, photonEfficacy: 1.1 })).toBe(1.1);
    expect(photonEfficacyOf({ wallWatts: 420, ppf: 1050 })).toBe(2.5);
    expect(photonEfficacyOf({ wallWatts: 420 })).toBeNull();
    expect(photonEfficacyOf({ wallWatts: 0, ppf: 1050 })).toBeNull();
  });

  it('drops only binary noise: 0.1 + 0.2 is 0.3, and 12 significant digits survive', () => {
    expect(shedFloatNoise(0.1 + 0.2)).toBe(0.3);
    expect(shedFloatNoise(123456.789012)).toBe(123456.789012);
    expect(shedFloatNoise(Number.NaN)).toBeNaN();
  });
});

describe('room figures from the editor', () => {
  it('adds lit hours over the phases: 18 h × 60 d + 12 h × 280 d is 4440 h', () => {
    expect(litHoursPerYear({ schedule: [{ hoursPerDay: 18, daysPerYear: 60 }, { hoursPerDay: 12, daysPerYear: 280 }] })).toBe(4440);
  });

  it('gives the canopy area as length × width: 9 m × 6 m is 54 m²', () => {
    expect(canopyArea({ canopy: { lengthM: 9, widthM: 6 } })).toBe(54);
  });
});
