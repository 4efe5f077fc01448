const formats = new Map<string, Intl.NumberFormat>();

/** A whole amount for chart axes and tooltips, without the minor unit (tables carry the exact figures). */
export function axisMoney(value: number, currency: string): string {
  let f = formats.get(currency);
  if (!f) {
    f = new Intl.NumberFormat(undefined, { style: 'currency', currency, maximumFractionDigits: 0, minimumFractionDigits: 0 });
    formats.set(currency, f);
  }
  return f.format(Math.round(value));
}
