import { createHash } from 'node:crypto';
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import fc from 'fast-check';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FIXTURE_CSV_COLUMNS } from '../../src/contracts/api/fixtures';
import type { ApiClient } from '../helpers/api-client';
import { signInBodies, uploadBodies } from '../helpers/fuzz-forms';
import type { FormBody } from '../helpers/fuzz-forms';
import { appRoutes, fillRoute, writeRoutes } from '../helpers/route-list';
import type { RouteKey } from '../helpers/route-list';
import { sampleScenario, seedInvitationFor, seedWorkspace } from '../helpers/seed';
import { demoAccount, startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';
import { GRID_3X3, PLANCK_2856, upload } from '../measurements/uploads';
import { csvBodies, jsonBodies } from './fuzz-bodies';

setFlagsFromString('--expose-gc');
const gc = runInNewContext('gc') as () => void;

/** Generated requests per route; 31 write routes × 15 stay within about a minute on a 2-core machine. */
const RUNS = Number(process.env.FUZZ_RUNS ?? 15);
let app: TestApp;
let owner: ApiClient;
let signInCsrf = '';
let signInCookie = '';
/** Path parameters: `main` is the workspace the writes go to, `victim` the one the DELETE routes empty. */
let main: Record<string, string>;
let victim: Record<string, string>;
let tables: string[] = [];
/**
 * Heap growth allowed after forced garbage collection, over the baseline taken once every route
 * has been warmed up: two runs here grew 2.8 MB and 3.0 MB. 8 MB leaves room for run-to-run spread;
 * over the ~470 requests after the baseline it fails a leak of more than about 18 kB per request.
 */
const HEAP_TOLERANCE = 8 * 1024 * 1024;

interface Spec {
  bodies: () => fc.Arbitrary<FormBody>;
  headers?: Record<string, string>;
  /** Sent without the owner's session: Auth.js's own sign-in posts carry its CSRF cookie instead. */
  as?: 'anonymous' | 'sign-in';
  /** For DELETE: which ids the route acts on (the victim workspace's), and the parameter to fuzz too. */
  params?: () => Record<string, string>;
  fuzzParam?: string;
}

const valid = {
  fixture: { key: 'fuzz-led', label: 'Fuzz LED', technology: 'led', wallWatts: 300, photonEfficacy: 2.5, fixturePrice: '300' },
  analysis: {
    version: 1,
    sweep: { vary: 'a', tariffLo: '0', tariffHi: '1', tariffN: '10', factorLo: '0.5', factorHi: '1.5', factorN: '10', showValueOf: 'a' },
    swings: { pct: '20', measure: 'option', a: 'a', b: 'b' },
    breakeven: { a: 'a', b: 'b' },
    uncertainty: { seed: '42', draws: '100', inputs: [] },
  },
};
const uploadFiles = fc.oneof(
  csvBodies('x_m,y_m,ppfd'),
  csvBodies('wavelength_nm,irradiance'),
  fc.constantFrom({ what: 'the worked 3 × 3 grid', bytes: new TextEncoder().encode(GRID_3X3) }, { what: 'a Planckian spectrum', bytes: new TextEncoder().encode(PLANCK_2856) }),
);
const json = (body: unknown) => () => jsonBodies(body);
const deleting = (param: string): Spec => ({ bodies: json({}), params: () => victim, fuzzParam: param });

/** Every write route of the app, by the key the router walk gives it (tests/helpers/route-list.ts). */
const SPECS: Record<string, Spec> = {
  'POST /api/account/sign-up': { bodies: json({ email: 'fuzz@example.org', name: 'Fuzz', password: 'a-long-enough-password' }), as: 'anonymous' },
  'POST /api/account/password': { bodies: json({ currentPassword: 'wrong-password-here', newPassword: 'another-long-password' }) },
  'POST /auth/callback/credentials': { bodies: () => signInBodies({ email: demoAccount('viewer').email, password: 'not-the-password' }, () => signInCsrf), as: 'sign-in' },
  'POST /auth/signin/nodemailer': { bodies: () => signInBodies({ email: 'link-fuzz@example.org' }, () => signInCsrf), as: 'sign-in' },
  'POST /api/workspaces': { bodies: json({ name: 'Fuzz room', currency: 'EUR', unitSystem: 'si' }) },
  'PATCH /api/workspaces/:wid': { bodies: json({ name: 'Renamed', currency: 'EUR' }) },
  'PATCH /api/workspaces/:wid/members/:userId': { bodies: json({ role: 'editor' }) },
  'POST /api/workspaces/:wid/invitations': { bodies: json({ email: 'invitee@example.org', role: 'viewer' }) },
  'POST /api/invitations/:token/accept': { bodies: json({}) },
  'POST /api/workspaces/:wid/fixtures': { bodies: json(valid.fixture) },
  'PATCH /api/workspaces/:wid/fixtures/:fid': { bodies: json({ label: 'Relabelled', wallWatts: 310 }) },
  'POST /api/workspaces/:wid/fixtures/import': { bodies: () => csvBodies(FIXTURE_CSV_COLUMNS.join(',')) },
  'POST /api/workspaces/:wid/scenarios': { bodies: () => jsonBodies({ document: sampleScenario('Fuzzed') }) },
  'PUT /api/workspaces/:wid/scenarios/:sid': { bodies: () => jsonBodies({ document: sampleScenario('Fuzzed') }), headers: { 'if-match': '1' } },
  'PUT /api/workspaces/:wid/scenarios/:sid/analysis': { bodies: json({ settings: valid.analysis }) },
  'POST /api/workspaces/:wid/scenarios/:sid/duplicate': { bodies: json({ title: 'Copy' }) },
  'POST /api/workspaces/:wid/scenarios/:sid/revisions/:rev/restore': { bodies: json({}) },
  'POST /api/workspaces/:wid/scenarios/:sid/snapshots': { bodies: json({ notes: 'n', expiresAt: null }) },
  'PATCH /api/workspaces/:wid/snapshots/:id': { bodies: json({ expiresAt: null }) },
  // Revoking is for good, so it acts on a snapshot of its own and the other snapshot routes keep a live link.
  'POST /api/workspaces/:wid/snapshots/:id/revoke': { bodies: json({}), params: () => ({ ...main, id: main.revocable ?? '' }) },
  'POST /api/workspaces/:wid/snapshots/:id/send': { bodies: json({ to: ['reader@example.org'], note: 'hi' }) },
  'POST /api/snapshots/:id/fork': { bodies: () => jsonBodies({ workspaceId: main.wid, title: 'Forked' }) },
  // Some bodies are cut short or name the wrong boundary, besides the wrong fields and files.
  'POST /api/workspaces/:wid/measurements': { bodies: () => uploadBodies(uploadFiles, () => main.fid ?? '') },
  'POST /api/workspaces/:wid/measurements/:mid/apply': { bodies: () => jsonBodies({ fixtureId: main.fid }) },
  'PATCH /api/admin/users/:uid': { bodies: json({ name: 'Renamed By Admin' }) },
  'DELETE /api/workspaces/:wid/members/:userId': deleting('userId'),
  'DELETE /api/workspaces/:wid/invitations/:iid': deleting('iid'),
  'DELETE /api/workspaces/:wid/fixtures/:fid': deleting('fid'),
  'DELETE /api/workspaces/:wid/measurements/:mid': deleting('mid'),
  'DELETE /api/workspaces/:wid/scenarios/:sid': deleting('sid'),
  // Last: it removes the victim workspace the other DELETE routes act on.
  'DELETE /api/workspaces/:wid': deleting('wid'),
};

/** A route parameter as generated: usually the real id, else text that is not one. */
const paramValue = (real: string) => fc.oneof({ arbitrary: fc.constant(real), weight: 2 }, fc.string({ minLength: 1, maxLength: 80 }), fc.constantFrom('0', '-1', '..', '%00', 'a'.repeat(5000), 'null'));

async function send(route: RouteKey, spec: Spec, body: FormBody, params: Record<string, string>): Promise<{ status: number; text: string }> {
  const method = route.slice(0, route.indexOf(' '));
  const headers: Record<string, string> = { ...spec.headers, 'content-type': body.contentType };
  if (spec.as === 'sign-in') Object.assign(headers, { cookie: signInCookie, 'x-auth-return-redirect': '1' });
  else if (spec.as !== 'anonymous') Object.assign(headers, { cookie: owner.jar.header() ?? '', 'x-csrf-token': owner.csrfToken ?? '' });
  const path = fillRoute(route, Object.fromEntries(Object.entries(params).map(([k, v]) => [k, encodeURIComponent(v)])));
  const res = await fetch(`${app.base}${path}`, { method, headers, body: body.bytes as Uint8Array<ArrayBuffer>, redirect: 'manual' });
  return { status: res.status, text: await res.text() };
}

/** Auth.js answers a refused sign-in with 200 and an error URL (X-Auth-Return-Redirect), or with a redirect to one. */
const refused = (r: { status: number; text: string }) => r.status >= 400 || /[?&]error=/.test(r.text) || (r.status >= 300 && r.status < 400);

/**
 * Rows that a refused request may write, by design, left out of the checksum: a failed password
 * sign-in is recorded in the audit log (action sign_in_failed, server/auth/auth-config.ts) so that
 * guessing shows up there. Rate-limit counters are kept in memory (express-rate-limit's default
 * store), not in the database.
 */
const ALLOWED_ON_REFUSAL: Record<string, string> = { audit_events: `WHERE "action" <> 'sign_in_failed'` };

/** SHA-256 of each table's rows, order-free (rows sorted as text; blobs by their own hash), so any changed, added or removed row shows. */
async function checksums(): Promise<Record<string, string>> {
  const out: Record<string, string> = {};
  for (const table of tables) {
    const rows = await app.running.sequelize.query<Record<string, unknown>>(`SELECT * FROM "${table}" ${ALLOWED_ON_REFUSAL[table] ?? ''}`, { type: QueryTypes.SELECT });
    const lines = rows.map((row) => JSON.stringify(Object.entries(row).map(([k, v]) => [k, Buffer.isBuffer(v) ? createHash('sha256').update(v).digest('hex') : v])));
    out[table] = createHash('sha256').update(lines.sort().join('\n')).digest('hex');
  }
  return out;
}

function heapAfterGc(): number {
  for (let i = 0; i < 4; i++) gc();
  return process.memoryUsage().heapUsed;
}

beforeAll(async () => {
  app = await startTestApp();
  owner = await app.signInAs('admin');
  const people = [{ email: demoAccount('admin').email, role: 'owner' as const }];
  const seed = async () => {
    const w = await seedWorkspace(app.m, people);
    const ids: Record<string, string> = { wid: w.workspaceId, fid: w.fixtureId, sid: w.scenarioId, iid: w.invitationId, userId: w.extraMemberId, uid: w.extraMemberId, rev: '1' };
    const grid = await upload(owner, w.workspaceId, { kind: 'grid', areaM2: 1.44, wallWatts: 320 }, { name: 'grid.csv', bytes: GRID_3X3 });
    ids.mid = grid.body.measurement.id as string;
    for (const name of ['id', 'revocable']) ids[name] = (await owner.post(`/api/workspaces/${w.workspaceId}/scenarios/${w.scenarioId}/snapshots`, {})).body.snapshot.id as string;
    return ids;
  };
  main = { ...(await seed()), token: await seedInvitationFor(app.m, 'someone-else@example.org') };
  victim = await seed();
  const signIn = app.client();
  signInCsrf = await signIn.authCsrf();
  signInCookie = signIn.jar.header() ?? '';
  tables = (await app.running.sequelize.getQueryInterface().showAllTables()).map(String).sort();
}, 240_000);
afterAll(async () => app?.close());

describe('generated bad input on every write route', () => {
  const problems: string[] = [];
  let baseline = 0;

  it('fuzzes exactly the write routes the app serves', () => {
    expect(Object.keys(SPECS).sort()).toEqual(writeRoutes(appRoutes(app.running.sequelize)));
  });

  it('has a checksum that sees a one-field change, and ignores only failed sign-ins in the audit log', async () => {
    const before = await checksums();
    expect((await owner.patch(`/api/workspaces/${main.wid}/fixtures/${main.fid}`, { label: 'Seen by the checksum' })).status).toBe(200);
    const changed = await checksums();
    expect(changed.fixtures).not.toBe(before.fixtures);
    const failed = await app.client().signIn(demoAccount('viewer').email, 'not-the-password');
    expect(failed.body.url).toContain('error=');
    expect(await checksums()).toEqual(changed);
  });

  it('warms every route up, then records the heap baseline', { timeout: 120_000 }, async () => {
    for (const [route, spec] of Object.entries(SPECS)) {
      if (route.startsWith('DELETE')) continue;
      await fc.assert(fc.asyncProperty(spec.bodies(), async (b) => (await send(route as RouteKey, spec, b, spec.params?.() ?? main)).status < 500), { numRuns: 3 });
    }
    baseline = heapAfterGc();
    expect(baseline).toBeGreaterThan(0);
  });

  for (const [route, spec] of Object.entries(SPECS)) {
    it(`${route}: never answers 5xx, and a refused request changes no row`, { timeout: 120_000 }, async () => {
      const params = fc.constant(null).chain(() => {
        const real = spec.params?.() ?? main;
        return spec.fuzzParam ? paramValue(real[spec.fuzzParam] ?? '').map((v) => ({ ...real, [spec.fuzzParam ?? '']: v })) : fc.constant(real);
      });
      let before = await checksums();
      await fc.assert(
        fc.asyncProperty(spec.bodies(), params, async (body, p) => {
          const reply = await send(route as RouteKey, spec, body, p);
          if (reply.status >= 500) problems.push(`${route} ${body.what}: ${reply.status} ${reply.text.slice(0, 200)}`);
          expect(reply.status, `${body.what}: ${reply.text.slice(0, 300)}`).toBeLessThan(500);
          const after = await checksums();
          if (refused(reply)) expect(after, `${body.what} → ${reply.status} ${reply.text.slice(0, 200)}`).toEqual(before);
          before = after;
        }),
        { numRuns: RUNS },
      );
      expect((await fetch(`${app.base}/api/health/live`)).status).toBe(200);
    });
  }

  // Found by this fuzzing: busboy's "Unexpected end of form" and "Multipart: Boundary not found"
  // once passed through receiveFile (server/routes/measurements.ts) as 500 internal.
  const cutShort: Array<[string, string]> = [
    ['multipart/form-data; boundary=x', ''],
    ['multipart/form-data; boundary=x', '--x\r\nContent-Disposition: form-data; name="kind"\r\n\r\ngr'],
    ['multipart/form-data', ''],
  ];
  it('POST …/measurements answers 400 and stores nothing for a multipart body cut short or without a boundary', async () => {
    const before = await checksums();
    for (const [contentType, text] of cutShort) {
      const reply = await send('POST /api/workspaces/:wid/measurements', { bodies: () => fc.constant(null as never) }, { what: 'cut short', contentType, bytes: new TextEncoder().encode(text) }, main);
      expect(reply.status, reply.text).toBe(400);
      expect(JSON.parse(reply.text).error.fields).toEqual([{ path: '(form)', message: 'is not a complete multipart form' }]);
    }
    expect(await checksums()).toEqual(before);
    expect((await fetch(`${app.base}/api/health/live`)).status).toBe(200);
  });

  it('stays up, and the heap after forced garbage collection returns near its baseline', async () => {
    expect(problems).toEqual([]);
    expect((await fetch(`${app.base}/api/health`)).status).toBe(200);
    const grown = heapAfterGc() - baseline;
    console.info(`heap after the fuzzing: ${(grown / 1024 / 1024).toFixed(1)} MB over the baseline`);
    expect(grown).toBeLessThan(HEAP_TOLERANCE);
  });
});
