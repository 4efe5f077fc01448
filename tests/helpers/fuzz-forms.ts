import fc from 'fast-check';

/** A generated request body: what it is, the Content-Type it claims, and its bytes. */
export interface FormBody {
  what: string;
  contentType: string;
  bytes: Uint8Array;
}

/** One part of a multipart/form-data body (RFC 7578): a field, or a file when it has a file name. */
interface Part {
  name: string;
  filename?: string;
  bytes: Uint8Array;
}

const utf8 = (text: string) => new TextEncoder().encode(text);
const concat = (chunks: Uint8Array[]) => new Uint8Array(chunks.flatMap((c) => [...c]));

/** Invalid UTF-8 (a lone continuation byte, an overlong NUL, a truncated sequence) around some text. */
const badUtf8 = fc.string({ maxLength: 20 }).map((s) => concat([utf8(s), new Uint8Array([0x80, 0xc0, 0x80, 0xe2, 0x82])]));
const text = (max: number) => fc.string({ maxLength: max }).map(utf8);
const odd = fc.oneof(text(40), badUtf8, fc.constantFrom('', ' ', '0', '-1', 'NaN', 'Infinity', '1e999', '0x10', '12abc', 'null', '[]', '{}').map(utf8));
const huge = fc.integer({ min: 5_000, max: 200_000 }).map((n) => utf8('9'.repeat(n)));
const number = fc.oneof(fc.double({ min: 0.001, max: 1e4, noNaN: true }).map((v) => utf8(String(v))), odd, huge);

function encode(parts: Part[], boundary: string, cut: number | null): Uint8Array {
  const chunks: Uint8Array[] = [];
  for (const p of parts) {
    const disposition = `form-data; name="${p.name}"${p.filename === undefined ? '' : `; filename="${p.filename}"`}`;
    chunks.push(utf8(`--${boundary}\r\nContent-Disposition: ${disposition}\r\n${p.filename === undefined ? '' : 'Content-Type: text/csv\r\n'}\r\n`), p.bytes, utf8('\r\n'));
  }
  chunks.push(utf8(`--${boundary}--\r\n`));
  const whole = concat(chunks);
  return cut === null ? whole : whole.slice(0, Math.floor(whole.length * cut));
}

/**
 * Bodies for the measurement upload (multipart/form-data, the file in the field `file`): the form
 * fields vary as much as the file (kind grid or spectrum or anything, a unit or junk, numbers that
 * are not numbers, huge and invalid UTF-8 values, unknown, repeated and missing fields), there are
 * zero to two files with odd names; with `malformed`, the body may also be cut short or claim the
 * wrong boundary.
 */
export function uploadBodies(files: fc.Arbitrary<{ what: string; bytes: Uint8Array }>, fixtureId: () => string, malformed = true): fc.Arbitrary<FormBody> {
  const field = (name: string, value: fc.Arbitrary<Uint8Array>) => fc.option(value.map((bytes): Part => ({ name, bytes })), { nil: undefined });
  const fileName = fc.oneof(fc.constantFrom('grid.csv', 'spectrum.csv', '../../etc/passwd', 'a"b.csv', ''), fc.string({ maxLength: 300 }));
  return fc
    .record({
      kind: field('kind', fc.oneof(fc.constantFrom('grid', 'spectrum').map(utf8), odd)),
      unit: field('unit', fc.oneof(fc.constantFrom('w', 'umol', 'relative').map(utf8), odd)),
      areaM2: field('areaM2', number),
      wallWatts: field('wallWatts', number),
      label: field('label', fc.oneof(text(120), huge, badUtf8)),
      fixtureId: field('fixtureId', fc.oneof(fc.constant(null).map(() => utf8(fixtureId())), odd)),
      unknown: fc.array(fc.tuple(fc.string({ minLength: 1, maxLength: 12 }), odd).map(([name, bytes]): Part => ({ name: name.replace(/["\r\n]/g, '_'), bytes })), { maxLength: 14 }),
      repeatKind: fc.boolean(),
      files: fc.array(fc.tuple(files, fileName), { maxLength: 2 }),
      cut: malformed ? fc.option(fc.double({ min: 0, max: 0.999, noNaN: true }), { freq: 8, nil: null }) : fc.constant(null),
      wrongBoundary: malformed ? fc.integer({ min: 0, max: 9 }).map((n) => n === 0) : fc.constant(false),
    })
    .map((g) => {
      const parts: Part[] = [g.kind, g.unit, g.areaM2, g.wallWatts, g.label, g.fixtureId].filter((p): p is Part => p !== undefined);
      if (g.repeatKind && g.kind) parts.push({ name: 'kind', bytes: utf8(g.kind.name === 'kind' ? 'spectrum' : 'grid') });
      parts.push(...g.unknown);
      for (const [file, name] of g.files) parts.push({ name: 'file', filename: name.replace(/["\r\n]/g, '_'), bytes: file.bytes });
      const boundary = 'fuzz-boundary-7f3a';
      const what = `fields ${parts.filter((p) => p.filename === undefined).map((p) => p.name).join(',') || '(none)'}; ${g.files.length} file(s) ${g.files.map(([f]) => f.what).join(', ')}${g.cut === null ? '' : `; cut at ${Math.round(g.cut * 100)} %`}`;
      return { what, contentType: `multipart/form-data; boundary=${g.wrongBoundary ? 'other' : boundary}`, bytes: encode(parts, boundary, g.cut) };
    });
}

/**
 * Bodies for Auth.js's sign-in posts (application/x-www-form-urlencoded, as the web client sends
 * them): the fields with wrong, huge, repeated or invalid percent-encoded values, unknown fields,
 * a wrong or missing CSRF token, JSON instead of a form, and random bytes.
 */
export function signInBodies(fields: Record<string, string>, csrfToken: () => string): fc.Arbitrary<FormBody> {
  const names = Object.keys(fields);
  const value = fc.oneof(
    fc.string({ maxLength: 60 }).map(encodeURIComponent),
    fc.integer({ min: 1_000, max: 15_000 }).map((n) => 'a'.repeat(n)),
    fc.constantFrom('%', '%zz', '%C0%80', '%FF%FE', '%00', '', '+', '%E2%82'),
  );
  const form = fc
    .record({
      changed: fc.dictionary(fc.constantFrom(...names, 'csrfToken', 'callbackUrl'), value, { maxKeys: 3 }),
      extra: fc.array(fc.tuple(fc.string({ minLength: 1, maxLength: 10 }).map(encodeURIComponent), value), { maxLength: 4 }),
      repeat: fc.option(fc.constantFrom(...names), { nil: undefined }),
      goodToken: fc.integer({ min: 0, max: 4 }).map((n) => n !== 0),
    })
    .map((g) => {
      const base: Record<string, string> = { ...Object.fromEntries(Object.entries(fields).map(([k, v]) => [k, encodeURIComponent(v)])), callbackUrl: '%2F' };
      if (g.goodToken) base.csrfToken = encodeURIComponent(csrfToken());
      const pairs = Object.entries({ ...base, ...g.changed }).concat(g.extra);
      if (g.repeat) pairs.push([g.repeat, 'second']);
      const body = pairs.map(([k, v]) => `${k}=${v}`).join('&');
      return { what: `form ${Object.keys(g.changed).join(',') || 'as sent'} changed${g.goodToken ? '' : ', no CSRF token'}`, contentType: 'application/x-www-form-urlencoded', bytes: utf8(body) };
    });
  const json = fc.jsonValue({ maxDepth: 3 }).map((v) => ({ what: 'JSON instead of a form', contentType: 'application/json', bytes: utf8(JSON.stringify({ ...fields, csrfToken: csrfToken(), extra: v })) }));
  const junk = fc.uint8Array({ maxLength: 4000 }).map((bytes) => ({ what: 'random bytes as a form', contentType: 'application/x-www-form-urlencoded', bytes }));
  return fc.oneof({ arbitrary: form, weight: 4 }, json, junk);
}
