import { z } from './zod-messages';

/** A plain decimal written as text: optional minus, digits, optional fraction. No exponent, no spaces. */
const DECIMAL_TEXT = /^-?\d+(\.\d+)?$/;

/**
 * A money amount as it may appear in a scenario file: a decimal string ("249.90") or a number.
 * Parsing keeps it as the canonical decimal text so that no value ever passes through binary
 * floating point on its way to decimal.js. Negative amounts are refused.
 */
export const moneySchema = z
  .union([z.string(), z.number()], { error: 'must be an amount, as text like "249.90" or a number' })
  .transform((value, ctx) => {
    const text = typeof value === 'number' ? numberToDecimalText(value) : value.trim();
    if (text === null || !DECIMAL_TEXT.test(text)) {
      ctx.addIssue({ code: 'custom', message: 'must be a plain decimal amount such as "249.90"' });
      return z.NEVER;
    }
    if (text.startsWith('-') && !/^-0+(\.0+)?$/.test(text)) {
      ctx.addIssue({ code: 'custom', message: 'must not be negative' });
      return z.NEVER;
    }
    return canonicalDecimalText(text);
  });

/** Amount text after parsing: canonical decimal, e.g. "249.9", "0", "1200". */
export type MoneyText = string;

function numberToDecimalText(value: number): string | null {
  if (!Number.isFinite(value)) return null;
  // toString switches to exponent form outside 1e-7..1e21; amounts in that range are nonsense anyway.
  const text = String(value);
  return /e/i.test(text) ? null : text;
}

/** Drops a leading plus-zero clutter and trailing fraction zeros: "0249.90" → "249.9", "-0" → "0". */
export function canonicalDecimalText(text: string): string {
  const negative = text.startsWith('-');
  const body = negative ? text.slice(1) : text;
  const [intPartRaw = '0', fracRaw = ''] = body.split('.');
  const intPart = intPartRaw.replace(/^0+(?=\d)/, '');
  const frac = fracRaw.replace(/0+$/, '');
  const joined = frac ? `${intPart}.${frac}` : intPart;
  return negative && joined !== '0' ? `-${joined}` : joined;
}
