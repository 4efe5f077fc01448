import { z } from '../zod-messages';
import { idSchema, instantSchema, roleSchema } from './common';

/** A member of a workspace. */
export const memberSchema = z.object({
  userId: idSchema,
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  joinedAt: instantSchema,
});
export type Member = z.infer<typeof memberSchema>;

/** GET /api/workspaces/:wid/members (every member may read it). */
export const memberListResponseSchema = z.object({ members: z.array(memberSchema) });

/** PATCH /api/workspaces/:wid/members/:userId (owners). A workspace always keeps at least one owner. */
export const updateMemberRequestSchema = z.strictObject({ role: roleSchema });
export type UpdateMemberRequest = z.input<typeof updateMemberRequestSchema>;

export const memberResponseSchema = z.object({ member: memberSchema });
