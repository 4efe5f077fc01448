import type { Decimal } from '../../engine/money';
import { minorUnitDigits, roundForDisplay } from '../../engine/money';

/**
 * Money for the PDF: rounded half-even to the currency's minor unit, with the ISO code rather than
 * a symbol because the PDF's built-in fonts cover only Latin-1.
 */
export function pdfMoney(value: string | Decimal, currency: string): string {
  const digits = minorUnitDigits(currency);
  const rounded = roundForDisplay(value, currency).toFixed(digits);
  const [int = '0', frac] = rounded.split('.');
  const grouped = int.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return `${currency} ${grouped}${frac ? `.${frac}` : ''}`;
}

/** A plain number with a fixed count of decimals and thousands separators. */
export function pdfNumber(value: number, decimals = 0): string {
  return value.toLocaleString('en-GB', { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
}

/** Replaces characters outside Latin-1 (superscript minus, ≤, en dashes…) that the PDF base fonts cannot draw. */
export function latin1(text: string): string {
  return text
    .replace(/[\u2012-\u2015]/g, '-')
    .replace(/\u207b/g, '-')
    .replace(/\u2264/g, '<=')
    .replace(/\u2265/g, '>=')
    .replace(/[\u2018\u2019]/g, "'")
    .replace(/[\u201c\u201d]/g, '"')
    .replace(/\u00d7/g, 'x')
    .replace(/[\u0100-\uffff]/g, '?');
}
