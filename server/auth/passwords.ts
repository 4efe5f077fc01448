import { randomBytes, scrypt, timingSafeEqual } from 'node:crypto';
import type { ScryptOptions } from 'node:crypto';

/**
 * scrypt cost: N = 2^15, r = 8, p = 1, about 32 MiB and a few tens of milliseconds per hash here.
 * Percival, "Stronger key derivation via sequential memory-hard functions" (2009), proposed
 * N = 2^14, r = 8, p = 1 for interactive logins on the hardware of its day (recalled from memory);
 * the parameters are stored with each hash so that they can be raised later.
 */
const COST = { N: 2 ** 15, r: 8, p: 1 };
const KEY_BYTES = 32;
const SALT_BYTES = 16;

function derive(password: string, salt: Buffer, o: { N: number; r: number; p: number }): Promise<Buffer> {
  const options: ScryptOptions = { N: o.N, r: o.r, p: o.p, maxmem: 256 * o.N * o.r };
  return new Promise((resolve, reject) =>
    scrypt(password.normalize('NFKC'), salt, KEY_BYTES, options, (err, key) => (err ? reject(err) : resolve(key))),
  );
}

/** Hashes a password as `scrypt$N$r$p$salt$key` (salt and key in base64url). */
export async function hashPassword(password: string): Promise<string> {
  const salt = randomBytes(SALT_BYTES);
  const key = await derive(password, salt, COST);
  return ['scrypt', COST.N, COST.r, COST.p, salt.toString('base64url'), key.toString('base64url')].join('$');
}

/** True when the password matches the stored hash; compares in constant time. */
export async function verifyPassword(password: string, stored: string): Promise<boolean> {
  const [scheme, n, r, p, salt, key] = stored.split('$');
  if (scheme !== 'scrypt' || !n || !r || !p || !salt || !key) return false;
  const expected = Buffer.from(key, 'base64url');
  const actual = await derive(password, Buffer.from(salt, 'base64url'), { N: Number(n), r: Number(r), p: Number(p) });
  return actual.length === expected.length && timingSafeEqual(actual, expected);
}

let decoy: Promise<string> | undefined;

/**
 * Spends the same work as a real check when there is no account or no password, so that the
 * time a failed sign-in takes does not tell whether the account exists.
 */
export async function verifyAgainstDecoy(password: string): Promise<false> {
  decoy ??= hashPassword(randomBytes(16).toString('hex'));
  await verifyPassword(password, await decoy);
  return false;
}
