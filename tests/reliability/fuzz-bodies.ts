import fc from 'fast-check';

/** A generated request body: the bytes to send and the Content-Type they claim to be. */
export interface FuzzBody {
  what: string;
  contentType: string;
  bytes: Uint8Array;
}

const utf8 = (text: string) => new TextEncoder().encode(text);
const json = (what: string, value: unknown): FuzzBody => ({ what, contentType: 'application/json', bytes: utf8(JSON.stringify(value) ?? 'null') });

const wrongType = fc.oneof(
  fc.constant(null),
  fc.boolean(),
  fc.integer(),
  fc.double(),
  fc.constantFrom(-0, 1e308, -1e308, Number.MAX_SAFE_INTEGER + 2),
  fc.string({ maxLength: 20 }),
  fc.array(fc.integer(), { maxLength: 5 }),
  fc.dictionary(fc.string({ maxLength: 8 }), fc.integer(), { maxKeys: 4 }),
);

/** Nested arrays and objects `depth` levels deep, as JSON text (JSON.stringify would recurse as deep). */
function deeplyNested(depth: number, kind: 'array' | 'object'): string {
  return kind === 'array' ? `${'['.repeat(depth)}1${']'.repeat(depth)}` : `${'{"a":'.repeat(depth)}1${'}'.repeat(depth)}`;
}

function setPath(target: unknown, path: string[], value: unknown): unknown {
  if (path.length === 0 || target === null || typeof target !== 'object') return value;
  const [head, ...rest] = path as [string, ...string[]];
  const copy: Record<string, unknown> = Array.isArray(target) ? ([...target] as unknown as Record<string, unknown>) : { ...(target as Record<string, unknown>) };
  copy[head] = setPath(copy[head], rest, value);
  return copy;
}

function paths(value: unknown, prefix: string[] = [], out: string[][] = []): string[][] {
  if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      out.push([...prefix, k]);
      if (prefix.length < 3) paths(v, [...prefix, k], out);
    }
  }
  return out;
}

/**
 * Bodies for a JSON write route: the route's valid body with one field given a wrong type or a huge
 * string, valid bodies with unknown fields, arbitrary JSON, deep nesting, invalid UTF-8 and random
 * bytes, and JSON sent under other content types.
 */
export function jsonBodies(valid: unknown): fc.Arbitrary<FuzzBody> {
  const fieldPaths = paths(valid);
  const mutated = fieldPaths.length
    ? fc.tuple(fc.constantFrom(...fieldPaths), wrongType).map(([p, v]) => json(`${p.join('.')} = ${JSON.stringify(v)}`, setPath(valid, p, v)))
    : wrongType.map((v) => json('wrong type', v));
  const huge = fieldPaths.length
    ? fc.tuple(fc.constantFrom(...fieldPaths), fc.integer({ min: 10_000, max: 400_000 }), fc.string({ minLength: 1, maxLength: 3 })).map(([p, n, s]) =>
        json(`${p.join('.')} = ${n} characters`, setPath(valid, p, s.repeat(Math.ceil(n / s.length)))),
      )
    : fc.constant(json('huge', 'x'.repeat(300_000)));
  const unknownFields = fc
    .dictionary(fc.string({ minLength: 1, maxLength: 12 }), fc.jsonValue({ maxDepth: 2 }), { minKeys: 1, maxKeys: 4 })
    .map((extra) => json(`unknown fields ${Object.keys(extra).join(',')}`, { ...(valid as object), ...extra }));
  const polluting = fc.constantFrom('__proto__', 'constructor', 'prototype').map((key) => ({
    what: `a "${key}" field`,
    contentType: 'application/json',
    bytes: utf8(`{"${key}":{"isSiteAdmin":true,"role":"owner"},${JSON.stringify(valid).slice(1)}`),
  }));
  const anyJson = fc.jsonValue({ maxDepth: 4 }).map((v) => json('arbitrary JSON', v));
  const nested = fc.tuple(fc.integer({ min: 100, max: 200_000 }), fc.constantFrom<'array' | 'object'>('array', 'object')).map(([d, k]) => ({
    what: `${k} nested ${d} deep`,
    contentType: 'application/json',
    bytes: utf8(deeplyNested(d, k)),
  }));
  const badUtf8 = fc.uint8Array({ minLength: 1, maxLength: 2000 }).map((junk) => {
    const text = JSON.stringify(valid);
    const cut = Math.floor(text.length / 2);
    return { what: 'invalid UTF-8 inside JSON', contentType: 'application/json; charset=utf-8', bytes: new Uint8Array([...utf8(text.slice(0, cut)), 0xff, 0xfe, 0xc3, ...junk, ...utf8(text.slice(cut))]) };
  });
  const randomBytes = fc.tuple(fc.uint8Array({ maxLength: 5000 }), fc.constantFrom('application/json', 'text/csv', 'text/plain', 'application/x-www-form-urlencoded', 'application/octet-stream', 'application/json; charset=utf-16')).map(
    ([bytes, contentType]) => ({ what: `random bytes as ${contentType}`, contentType, bytes }),
  );
  return fc.oneof(mutated, huge, unknownFields, polluting, anyJson, nested, badUtf8, randomBytes);
}

/** Bodies for a CSV route: random bytes, CSV-looking text with wrong cells, huge lines and invalid UTF-8. */
export function csvBodies(validHeader: string): fc.Arbitrary<FuzzBody> {
  const cell = fc.oneof(fc.string({ maxLength: 30 }), fc.double().map(String), fc.constantFrom('', '"', '""', '"a,b"', '=cmd|x', 'NaN', '-Infinity', '1e999'));
  const lines = fc.array(fc.array(cell, { maxLength: 12 }), { maxLength: 60 }).map((rows) => `${validHeader}\n${rows.map((r) => r.join(',')).join('\n')}`);
  return fc.oneof(
    fc.uint8Array({ maxLength: 20_000 }).map((bytes) => ({ what: 'random bytes', contentType: 'text/csv', bytes })),
    lines.map((text) => ({ what: 'CSV with odd cells', contentType: 'text/csv', bytes: utf8(text) })),
    fc.integer({ min: 1000, max: 2_000_000 }).map((n) => ({ what: `one line of ${n} characters`, contentType: 'text/csv', bytes: utf8(`${validHeader}\n${'9,'.repeat(n / 2)}`) })),
    fc.uint8Array({ minLength: 1, maxLength: 500 }).map((junk) => ({ what: 'invalid UTF-8 in CSV', contentType: 'text/csv; charset=utf-8', bytes: new Uint8Array([...utf8(`${validHeader}\n`), 0xc0, 0x80, ...junk]) })),
  );
}
