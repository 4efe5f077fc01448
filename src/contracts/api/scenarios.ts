import { z } from '../zod-messages';
import { scenarioSchema } from '../scenario';
import { idSchema, instantSchema, pageOf, plainText, userRefSchema } from './common';

/** A stored scenario: the scenario file itself (format photon-parity/scenario@1) and its revision counter. */
export const scenarioRecordSchema = z.object({
  id: idSchema,
  workspaceId: idSchema,
  /** Always the document's own title. */
  title: z.string(),
  document: scenarioSchema,
  /** 1 for a new scenario, +1 on every save or restore; echo it in If-Match when saving. */
  revision: z.number().int().positive(),
  createdAt: instantSchema,
  updatedAt: instantSchema,
  updatedBy: userRefSchema,
});
export type ScenarioRecord = z.infer<typeof scenarioRecordSchema>;

/** One line of the scenario list. */
export const scenarioSummarySchema = scenarioRecordSchema.omit({ document: true }).extend({ optionCount: z.number().int() });
export type ScenarioSummary = z.infer<typeof scenarioSummarySchema>;

/** GET /api/workspaces/:wid/scenarios?q=&page=&pageSize=: `q` matches the title, case-insensitively; newest change first. */
export const scenarioListResponseSchema = pageOf(scenarioSummarySchema);
export type ScenarioListResponse = z.infer<typeof scenarioListResponseSchema>;

/** POST /api/workspaces/:wid/scenarios (editors and owners). */
export const createScenarioRequestSchema = z.strictObject({ document: scenarioSchema });
export type CreateScenarioRequest = z.input<typeof createScenarioRequestSchema>;

/**
 * PUT /api/workspaces/:wid/scenarios/:sid (editors and owners) with header `If-Match: <revision>`
 * naming the revision the edit started from. A stale revision is refused with 409 `conflict`,
 * and the reply's fields hold `{ path: "revision", message: "current revision is N" }`.
 */
export const updateScenarioRequestSchema = z.strictObject({ document: scenarioSchema });
export type UpdateScenarioRequest = z.input<typeof updateScenarioRequestSchema>;

/** POST …/scenarios/:sid/duplicate: an optional title for the copy (default: the original's with " (copy)"). */
export const duplicateScenarioRequestSchema = z.strictObject({ title: plainText(200).optional() });
export type DuplicateScenarioRequest = z.input<typeof duplicateScenarioRequestSchema>;

export const scenarioResponseSchema = z.object({ scenario: scenarioRecordSchema });

/** What a revision did. */
export const revisionActionSchema = z.enum(['created', 'edited', 'restored', 'duplicated']);

/** One entry of a scenario's append-only history: who, when, and which field paths changed. */
export const revisionSummarySchema = z.object({
  revision: z.number().int().positive(),
  title: z.string(),
  action: revisionActionSchema,
  /** Field paths that differ from the previous revision, e.g. `electricity.pricePerKwh`, `options[1].wallWatts`. */
  changedPaths: z.array(z.string()),
  /** For a restore, the revision brought back; for a duplicate, the source scenario's revision. */
  fromRevision: z.number().int().nullable(),
  createdAt: instantSchema,
  createdBy: userRefSchema,
});
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;

/** GET …/scenarios/:sid/revisions: newest first. */
export const revisionListResponseSchema = z.object({ revisions: z.array(revisionSummarySchema) });

/** GET …/scenarios/:sid/revisions/:rev: the document as it was. */
export const revisionDetailSchema = revisionSummarySchema.extend({ document: scenarioSchema });
export const revisionResponseSchema = z.object({ revision: revisionDetailSchema });

/** Path parameters of scenario routes. */
export const revisionParamSchema = z.coerce
  .number({ error: 'must be a revision number' })
  .int({ error: 'must be a revision number' })
  .positive({ error: 'must be a revision number' });

/** The If-Match header of PUT: a revision number, bare or as a quoted entity tag. */
export const ifMatchSchema = z
  .string({ error: 'is required: send If-Match with the revision the edit started from' })
  .trim()
  .transform((v) => v.replace(/^W\//, '').replace(/^"(.*)"$/, '$1'))
  .pipe(z.string().regex(/^[1-9]\d{0,9}$/, { error: 'must be a revision number, e.g. If-Match: 3' }))
  .transform(Number);
