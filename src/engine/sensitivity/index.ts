/**
 * Sensitivity and uncertainty: sweeps, one-at-a-time swings, break-even prices and multipliers,
 * and seeded uncertainty runs, all priced on the fast path that mirrors the decimal ledger.
 * Every run has a plan step and a chunk step so that a worker can report progress and stop between chunks.
 */
export { SWEEP_FORMAT, assembleSweep, axisValues, planSweep, runSweep, sweepRows } from './sweep';
export type { SweepPlan, SweepResult, SweepRows } from './sweep';
export { checkSwingSettings, measureValue, planSwings, rankSwings, runSwings, swingRows } from './swings';
export type { SwingPlan, SwingResult, SwingRow } from './swings';
export { BREAKEVEN_FORMAT, breakevenDocument, breakevenEfficacy, breakevenPrice } from './breakeven';
export type { EfficacyBreakeven, NoBreakevenReason, PriceBreakeven } from './breakeven';
export { efficacyBreakevenFigures, presentValueGap } from './breakeven-figures';
export type { EfficacyBreakevenFigures } from './breakeven-figures';
export { planUncertainty, runUncertainty, summarizeUncertainty, uncertaintyDraws } from './uncertainty';
export type { UncertaintyChunk, UncertaintyOption, UncertaintyPlan, UncertaintySummary } from './uncertainty';
export type { DrawRoute } from './draw-route';
export { checkOptionId, checkSweepSettings, checkUncertaintySettings, maxEfficacyFactor, optionIndexOf } from './checks';
export { clampToBounds, numericInputs, withinBounds } from './inputs';
export type { InputBounds, NumericInput } from './inputs';
export { ledgerPresentValues } from './ledger-values';
export { seedXoshiro128, splitMix64, unitInterval, xoshiro128ssNext } from './prng';
export type { Xoshiro128State } from './prng';
export { quantileSorted } from './quantile';
export { triangularMean, triangularQuantile } from './triangular';
