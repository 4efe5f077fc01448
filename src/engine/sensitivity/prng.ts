/**
 * Seeded pseudo-random numbers that are the same on every machine: integer arithmetic only
 * (Math.imul and 32-bit shifts), no Math.random.
 *
 * Generator: xoshiro128** 1.1 (D. Blackman and S. Vigna, "Scrambled linear pseudorandom number
 * generators", ACM Transactions on Mathematical Software 47(4), 2021). Its 128-bit state is filled
 * from the seed with SplitMix64 (G. L. Steele, D. Lea and C. H. Flood, "Fast splittable
 * pseudorandom number generators", OOPSLA 2014), as the xoshiro authors recommend.
 */

/** xoshiro128** state: four unsigned 32-bit words, not all zero. */
export type Xoshiro128State = Uint32Array;

const rotl = (x: number, k: number): number => (x << k) | (x >>> (32 - k));

/**
 * Advances the state once and returns the next output.
 * @returns an unsigned 32-bit integer, 0 … 2³² − 1
 */
export function xoshiro128ssNext(s: Xoshiro128State): number {
  const s0 = s[0]!;
  const s1 = s[1]!;
  const result = Math.imul(rotl(Math.imul(s1, 5), 7), 9) >>> 0;
  const t = s1 << 9;
  const s2 = s[2]! ^ s0;
  const s3 = s[3]! ^ s1;
  s[1] = s1 ^ s2;
  s[0] = s0 ^ s3;
  s[2] = s2 ^ t;
  s[3] = rotl(s3, 11);
  return result;
}

const MASK64 = (1n << 64n) - 1n;

/** SplitMix64 outputs for a seed, as unsigned 64-bit BigInts. */
export function splitMix64(seed: bigint, count: number): bigint[] {
  let x = seed & MASK64;
  const out: bigint[] = [];
  for (let i = 0; i < count; i++) {
    x = (x + 0x9e3779b97f4a7c15n) & MASK64;
    let z = x;
    z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK64;
    z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK64;
    out.push(z ^ (z >> 31n));
  }
  return out;
}

/**
 * A fresh xoshiro128** state for a seed: two SplitMix64 outputs, low word first.
 * @param seed a whole number 0 … 2³² − 1
 */
export function seedXoshiro128(seed: number): Xoshiro128State {
  const [a = 0n, b = 0n] = splitMix64(BigInt(seed >>> 0), 2);
  const words = [a & 0xffffffffn, a >> 32n, b & 0xffffffffn, b >> 32n].map(Number);
  return Uint32Array.from(words);
}

/**
 * Turns a 32-bit output into a uniform number strictly inside (0, 1): (x + ½) / 2³², so that
 * inverse distribution functions never see exactly 0 or 1.
 */
export function unitInterval(x: number): number {
  return (x + 0.5) * 2.3283064365386963e-10;
}
