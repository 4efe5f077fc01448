import DecimalJs from 'decimal.js';

/**
 * The engine's decimal type: 34 significant digits (as IEEE 754 decimal128), half-even rounding,
 * and plain (never exponential) text for any amount a ledger can hold.
 */
export const Decimal = DecimalJs.clone({
  precision: 34,
  rounding: DecimalJs.ROUND_HALF_EVEN,
  toExpNeg: -40,
  toExpPos: 40,
});
/** An instance of the engine's decimal type. */
export type Decimal = InstanceType<typeof Decimal>;

/** Money or a plain number as a Decimal. Numbers go through their shortest round-trip text, so 0.1 stays 0.1. */
export function dec(value: string | number | Decimal): Decimal {
  return new Decimal(value);
}

/** Zero, shared. */
export const ZERO = new Decimal(0);

/** Full-precision decimal text for results: no exponent, no trailing zeros. */
export function moneyText(value: Decimal): string {
  return value.toString();
}

/** Minor-unit digits of a currency (ISO 4217), e.g. 2 for EUR, 0 for JPY; read from Intl where present. */
export function minorUnitDigits(currency: string): number {
  try {
    return new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
  } catch {
    return 2;
  }
}

/** Rounds an amount for display only: half-even to the currency's minor unit. */
export function roundForDisplay(value: Decimal | string, currency: string): Decimal {
  return new Decimal(value).toDecimalPlaces(minorUnitDigits(currency), Decimal.ROUND_HALF_EVEN);
}
