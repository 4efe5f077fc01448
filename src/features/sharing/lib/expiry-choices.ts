const DAY_MS = 86_400_000;

/** How long a new or changed link may work, as offered in the share panel. */
export const EXPIRY_CHOICES = [
  { value: 'never', label: 'until withdrawn', days: null },
  { value: '7', label: 'for 7 days', days: 7 },
  { value: '30', label: 'for 30 days', days: 30 },
  { value: '90', label: 'for 90 days', days: 90 },
] as const;

export type ExpiryChoice = (typeof EXPIRY_CHOICES)[number]['value'];

/** The expiry instant for a choice, counted from `now`; null for no expiry. */
export function expiryFor(choice: ExpiryChoice, now = Date.now()): string | null {
  const days = EXPIRY_CHOICES.find((c) => c.value === choice)?.days ?? null;
  return days === null ? null : new Date(now + days * DAY_MS).toISOString();
}

/** Splits typed addresses on commas, semicolons, spaces and line breaks. */
export function splitAddresses(text: string): string[] {
  return text.split(/[\s,;]+/).map((a) => a.trim()).filter(Boolean);
}
