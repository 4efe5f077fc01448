import { z } from '../zod-messages';
import { scenarioSchema } from '../scenario';
import { analysisSettingsSchema } from './analysis';
import { dataSourceSchema } from './fixtures';
import { emailSchema, idSchema, instantSchema, plainText, userRefSchema } from './common';
import { scenarioResultSchema } from './result';

/** Length of a snapshot id: nanoid's default, 21 characters of A–Z a–z 0–9 _ - (about 126 random bits). */
export const SNAPSHOT_ID_LENGTH = 21;

/** A snapshot id as it appears in a share link `/s/<id>`. */
export const snapshotIdSchema = z.string().regex(/^[A-Za-z0-9_-]{21}$/, { error: 'is not a share link id' });

/** Longest note a publisher can attach to a snapshot. */
export const SNAPSHOT_NOTES_MAX = 4000;

/** Whether a share link still opens: live, withdrawn by an editor, or past its expiry. */
export const snapshotLinkStatusSchema = z.enum(['live', 'revoked', 'expired']);
export type SnapshotLinkStatus = z.infer<typeof snapshotLinkStatusSchema>;

/**
 * Where each option's figures came from, copied from the workspace's fixture library when the
 * snapshot was made. `dataSource` is null when no library entry had the option's id.
 */
export const snapshotFixtureSchema = z.object({
  optionId: z.string(),
  label: z.string(),
  technology: z.string(),
  dataSource: dataSourceSchema.nullable(),
  libraryNotes: z.string(),
  /** whether the option in the scenario had the same figures as the library entry */
  matchesLibrary: z.boolean(),
  libraryUpdatedAt: instantSchema.nullable(),
});
export type SnapshotFixture = z.infer<typeof snapshotFixtureSchema>;

/** One measurement summary copied into a snapshot: a PPFD grid or a spectrum, with its figures. */
export const snapshotMeasurementSchema = z.object({
  kind: z.string(),
  name: z.string(),
  /** the option whose figures the measurement concerns, when linked */
  optionId: z.string().nullable(),
  /** figure name to value, e.g. { "mean PPFD (µmol/m²/s)": 612 } */
  figures: z.record(z.string(), z.union([z.number(), z.string(), z.null()])),
  measuredAt: instantSchema.nullable(),
});
export type SnapshotMeasurement = z.infer<typeof snapshotMeasurementSchema>;

/** The immutable part of a snapshot, as anyone holding the link reads it. */
export const publicSnapshotSchema = z.object({
  id: snapshotIdSchema,
  title: z.string(),
  createdAt: instantSchema,
  publishedBy: z.string(),
  /** the validated scenario file (photon-parity/scenario@1) the figures were computed from */
  scenario: scenarioSchema,
  notes: z.string(),
  fixtures: z.array(snapshotFixtureSchema),
  measurements: z.array(snapshotMeasurementSchema),
  /** computed by the server from the stored scenario when the snapshot was made */
  result: scenarioResultSchema,
  engineVersion: z.string(),
  /** SHA-256 (hex) of the canonical scenario JSON */
  inputHash: z.string().regex(/^[0-9a-f]{64}$/),
  /**
   * The sensitivity settings kept with the scenario when the snapshot was made (uncertainty ranges,
   * number of draws and seed among them), frozen with it; absent when there were none. Not covered
   * by `inputHash`, which stays the hash of the scenario alone.
   */
  analysis: analysisSettingsSchema.optional(),
});
export type PublicSnapshot = z.infer<typeof publicSnapshotSchema>;

/** The mutable state of a share link. */
export const snapshotLinkSchema = z.object({
  status: snapshotLinkStatusSchema,
  expiresAt: instantSchema.nullable(),
  revokedAt: instantSchema.nullable(),
});
export type SnapshotLink = z.infer<typeof snapshotLinkSchema>;

/** GET /api/snapshots/:id (no sign-in): 200 while the link is live, 410 `gone` once revoked or expired, 404 for an unknown id. */
export const snapshotResponseSchema = z.object({ link: snapshotLinkSchema, snapshot: publicSnapshotSchema });
export type SnapshotResponse = z.infer<typeof snapshotResponseSchema>;

/** One line of a workspace's list of snapshots (editors and owners). */
export const snapshotSummarySchema = z.object({
  id: snapshotIdSchema,
  workspaceId: idSchema,
  scenarioId: idSchema,
  scenarioRevision: z.number().int(),
  title: z.string(),
  notes: z.string(),
  inputHash: z.string(),
  engineVersion: z.string(),
  createdAt: instantSchema,
  createdBy: userRefSchema,
  link: snapshotLinkSchema,
});
export type SnapshotSummary = z.infer<typeof snapshotSummarySchema>;

/** GET /api/workspaces/:wid/snapshots and GET …/scenarios/:sid/snapshots: newest first. */
export const snapshotListResponseSchema = z.object({ snapshots: z.array(snapshotSummarySchema) });
export type SnapshotListResponse = z.infer<typeof snapshotListResponseSchema>;

export const snapshotSummaryResponseSchema = z.object({ snapshot: snapshotSummarySchema });

const futureInstant = instantSchema.refine((v) => Date.parse(v) > Date.now(), { error: 'must be in the future' });

/**
 * POST /api/workspaces/:wid/scenarios/:sid/snapshots (editors and owners): freezes the scenario's
 * current stored revision. The server computes the result itself; nothing here carries figures.
 */
export const createSnapshotRequestSchema = z.strictObject({
  notes: z.string({ error: 'must be text' }).trim().max(SNAPSHOT_NOTES_MAX, { error: `must be at most ${SNAPSHOT_NOTES_MAX} characters` }).default(''),
  expiresAt: futureInstant.nullable().default(null),
});
export type CreateSnapshotRequest = z.input<typeof createSnapshotRequestSchema>;

/** PATCH /api/workspaces/:wid/snapshots/:id (editors and owners): a new expiry, or null for none. */
export const updateSnapshotLinkRequestSchema = z.strictObject({ expiresAt: futureInstant.nullable() });
export type UpdateSnapshotLinkRequest = z.input<typeof updateSnapshotLinkRequestSchema>;

/** Most addresses one share e-mail may go to. */
export const SNAPSHOT_MAIL_MAX_RECIPIENTS = 10;

/** POST /api/workspaces/:wid/snapshots/:id/send (editors and owners): e-mails the link with a note. */
export const sendSnapshotRequestSchema = z.strictObject({
  to: z
    .array(emailSchema, { error: 'must be a list of e-mail addresses' })
    .min(1, { error: 'needs at least one address' })
    .max(SNAPSHOT_MAIL_MAX_RECIPIENTS, { error: `must have at most ${SNAPSHOT_MAIL_MAX_RECIPIENTS} addresses` }),
  note: z.string({ error: 'must be text' }).trim().max(2000, { error: 'must be at most 2000 characters' }).default(''),
});
export type SendSnapshotRequest = z.input<typeof sendSnapshotRequestSchema>;

export const sendSnapshotResponseSchema = z.object({ sent: z.array(z.string()) });

/** POST /api/snapshots/:id/fork (signed in): copies the snapshot's scenario into a workspace where the caller edits. */
export const forkSnapshotRequestSchema = z.strictObject({ workspaceId: idSchema, title: plainText(200).optional() });
export type ForkSnapshotRequest = z.input<typeof forkSnapshotRequestSchema>;

/** Where a scenario was copied from, when it was forked from a snapshot. */
export const scenarioOriginSchema = z.object({ snapshotId: snapshotIdSchema, forkedAt: instantSchema }).nullable();

/** GET …/scenarios/:sid/snapshots also says which snapshot the scenario was forked from. */
export const scenarioSnapshotsResponseSchema = snapshotListResponseSchema.extend({ forkedFrom: scenarioOriginSchema });
export type ScenarioSnapshotsResponse = z.infer<typeof scenarioSnapshotsResponseSchema>;

/** One line of text per measurement summary, for the PDF report and plain listings. */
export function measurementLines(measurements: readonly SnapshotMeasurement[]): string[] {
  return measurements.map((ms) => {
    const figures = Object.entries(ms.figures)
      .filter(([, v]) => v !== null)
      .map(([k, v]) => `${k} ${typeof v === 'number' ? Number(v.toPrecision(4)) : v}`)
      .join(', ');
    return `${ms.kind} "${ms.name}"${ms.optionId ? ` (option ${ms.optionId})` : ''}: ${figures || 'no figures'}`;
  });
}
