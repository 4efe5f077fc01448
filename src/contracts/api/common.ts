import { z } from '../zod-messages';
import { orRequired } from '../scenario';

/** Server-made identifiers (nanoid or UUID): letters, digits, `_` and `-`. */
export const idSchema = z
  .string({ error: orRequired('must be an id') })
  .regex(/^[A-Za-z0-9_-]{1,64}$/, { error: 'must be an id of letters, digits, "_" and "-"' });

/** A member's role in one workspace. Owners manage members, invitations and settings; editors change data; viewers read. */
export const roleSchema = z.enum(['owner', 'editor', 'viewer'], { error: orRequired('must be one of owner, editor, viewer') });
export type Role = z.infer<typeof roleSchema>;

/** How the workspace shows lengths and areas: SI (m, m²) or imperial (ft, ft²). Stored figures stay SI. */
export const unitSystemSchema = z.enum(['si', 'imperial'], { error: orRequired('must be "si" or "imperial"') });
export type UnitSystem = z.infer<typeof unitSystemSchema>;

const knownCurrencies: ReadonlySet<string> | null =
  typeof Intl.supportedValuesOf === 'function' ? new Set(Intl.supportedValuesOf('currency')) : null;

/** An ISO 4217 currency code as listed by the runtime's Intl data, e.g. EUR. */
export const currencySchema = z
  .string({ error: orRequired('must be text') })
  .regex(/^[A-Z]{3}$/, { error: 'must be a three-letter ISO 4217 code such as EUR' })
  .refine((c) => knownCurrencies === null || knownCurrencies.has(c), { error: 'is not an ISO 4217 currency code' });

/** An instant as ISO 8601 text in UTC, e.g. 2025-03-01T09:30:00.000Z. */
export const instantSchema = z.string().datetime({ offset: true });

/** Text with surrounding spaces removed, 1 to max characters. */
export const plainText = (max: number) =>
  z
    .string({ error: orRequired('must be text') })
    .trim()
    .min(1, { error: 'must not be empty' })
    .max(max, { error: `must be at most ${max} characters` });

/** An e-mail address, trimmed and lower-cased so that one address is one account. */
export const emailSchema = z
  .string({ error: orRequired('must be text') })
  .trim()
  .toLowerCase()
  .max(254, { error: 'must be at most 254 characters' })
  .pipe(z.email({ error: 'must be an e-mail address' }));

/** Who did something, as shown next to a change. */
export const userRefSchema = z.object({ id: idSchema, name: z.string() });
export type UserRef = z.infer<typeof userRefSchema>;

/** Query-string number: the text "3" becomes 3. */
const queryInt = (min: number, max: number, fallback: number) =>
  z.coerce
    .number({ error: 'must be a whole number' })
    .int({ error: 'must be a whole number' })
    .min(min, { error: `must be at least ${min}` })
    .max(max, { error: `must be at most ${max}` })
    .default(fallback);

/** `?q=&page=&pageSize=` of every searchable list; pages count from 1. */
export const listQuerySchema = z.strictObject({
  q: z.string().trim().max(200, { error: 'must be at most 200 characters' }).optional(),
  page: queryInt(1, 100_000, 1),
  pageSize: queryInt(1, 100, 20),
});
export type ListQuery = z.infer<typeof listQuerySchema>;

/** One page of a list with the total count of matches. */
export const pageOf = <T extends z.ZodType>(item: T) =>
  z.object({ items: z.array(item), total: z.number().int(), page: z.number().int(), pageSize: z.number().int() });

/** A request body with no fields (some actions take none). */
export const emptyBodySchema = z.strictObject({});
