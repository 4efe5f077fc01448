import { Decimal, minorUnitDigits, roundForDisplay } from '../engine/money';

const numberFormats = new Map<string, Intl.NumberFormat>();
function nf(key: string, make: () => Intl.NumberFormat): Intl.NumberFormat {
  let f = numberFormats.get(key);
  if (!f) {
    f = make();
    numberFormats.set(key, f);
  }
  return f;
}

/**
 * An amount in the workspace currency, from full-precision decimal text: rounded half-even to the
 * currency's minor unit by the engine first, then laid out by Intl (which would round half-expand).
 */
export function formatMoney(amount: string, currency: string, locale?: string): string {
  const rounded = roundForDisplay(amount, currency);
  const digits = minorUnitDigits(currency);
  const f = nf(`money|${currency}|${locale ?? ''}|${digits}`, () =>
    new Intl.NumberFormat(locale, { style: 'currency', currency, minimumFractionDigits: digits, maximumFractionDigits: digits }),
  );
  // Intl formats decimal strings exactly (ES2023 Intl.NumberFormat v3), so no float is involved.
  return f.format(rounded.toFixed(digits) as `${number}`);
}

/** An amount to a number of decimals beyond the minor unit (for cost per mol, e.g. 0.0123), rounded half-even. */
export function formatSmallMoney(amount: string, currency: string, digits = 4, locale?: string): string {
  const f = nf(`small|${currency}|${locale ?? ''}|${digits}`, () =>
    new Intl.NumberFormat(locale, { style: 'currency', currency, minimumFractionDigits: digits, maximumFractionDigits: digits }),
  );
  return f.format(new Decimal(amount).toDecimalPlaces(digits, Decimal.ROUND_HALF_EVEN).toFixed(digits) as `${number}`);
}

/** A plain figure with a fixed number of decimals. */
export function formatNumber(value: number, digits = 0, locale?: string): string {
  const f = nf(`num|${locale ?? ''}|${digits}`, () =>
    new Intl.NumberFormat(locale, { minimumFractionDigits: digits, maximumFractionDigits: digits }),
  );
  return f.format(value);
}

/** A date-time from ISO text, short and local. */
export function formatDateTime(iso: string, locale?: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : d.toLocaleString(locale, { dateStyle: 'medium', timeStyle: 'short' });
}
