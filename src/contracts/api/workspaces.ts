import { z } from '../zod-messages';
import { currencySchema, idSchema, instantSchema, plainText, roleSchema, unitSystemSchema } from './common';

/** A workspace as its members see it, with the caller's own role in it. */
export const workspaceSchema = z.object({
  id: idSchema,
  name: z.string(),
  currency: currencySchema,
  unitSystem: unitSystemSchema,
  role: roleSchema,
  memberCount: z.number().int(),
  createdAt: instantSchema,
  updatedAt: instantSchema,
});
export type Workspace = z.infer<typeof workspaceSchema>;

/** GET /api/workspaces: the caller's workspaces. */
export const workspaceListResponseSchema = z.object({ workspaces: z.array(workspaceSchema) });

/** POST /api/workspaces: the caller becomes its owner. */
export const createWorkspaceRequestSchema = z.strictObject({
  name: plainText(120),
  currency: currencySchema,
  unitSystem: unitSystemSchema.default('si'),
});
export type CreateWorkspaceRequest = z.input<typeof createWorkspaceRequestSchema>;

/** PATCH /api/workspaces/:wid (owners): any of the settings, at least one. */
export const updateWorkspaceRequestSchema = z
  .strictObject({
    name: plainText(120).optional(),
    currency: currencySchema.optional(),
    unitSystem: unitSystemSchema.optional(),
  })
  .refine((b) => Object.keys(b).length > 0, { error: 'give at least one of name, currency, unitSystem' });
export type UpdateWorkspaceRequest = z.input<typeof updateWorkspaceRequestSchema>;

/** Path parameters of workspace routes. */
export const workspaceParamsSchema = z.object({ wid: idSchema });
