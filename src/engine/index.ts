/**
 * The engine's public surface: pure functions from plain data to plain data, shared by the
 * browser, its worker, the server and the command line.
 */
export { computeScenario } from './compute';
export { compileFast, fastPresentValue } from './fast-path';
export type { FastScenario, FastOption } from './fast-path';
export { canonicalScenarioJson, scenarioHash, sha256Hex } from './canonical';
export { canopyArea, dliFromPpfd, fixtureFlux, level, litHoursPerYear, outputFactor, ppfdFromDli, targetPpfd } from './leveling';
export { replacementsByYear } from './relamping';
export { cumulativeAt, paybackYears } from './payback';
export { continuousLimit, fixtureCurrent, fixturesPerCircuit, lightingHeatWatts, planCircuits, CONTINUOUS_LOAD_SHARE } from './circuits';
export type { CircuitInput, CircuitPlan } from './circuits';
export { convertOutput, convertTarget, efficacyFromPpf, photonEfficacyOf, ppfFromEfficacy, shedFloatNoise, switchEntry, ENTRY_SIGNIFICANT_DIGITS } from './entry-conversions';
export type { EntrySwitch, OutputMode, TargetMode } from './entry-conversions';
export * from './units-convert';
export { Decimal, dec, minorUnitDigits, roundForDisplay } from './money';
export { RESULT_FORMAT } from './result-types';
export type { LedgerYear, OptionResult, ScenarioResult } from './result-types';
export { ENGINE_VERSION } from './version';
export { parseScenario } from './parse';
export { compareResults, FIGURE_TOLERANCE } from './reproduce';
export type { FigureDifference, ReproduceReport } from './reproduce';
export * from './measurements';
export * from './sensitivity';
