import { z } from '../zod-messages';
import { idSchema, instantSchema, pageOf, plainText } from './common';

/** A user account as site admins see it. */
export const adminUserSchema = z.object({
  id: idSchema,
  email: z.string(),
  name: z.string(),
  isSiteAdmin: z.boolean(),
  disabled: z.boolean(),
  workspaceCount: z.number().int(),
  createdAt: instantSchema,
});
export type AdminUser = z.infer<typeof adminUserSchema>;

/** GET /api/admin/users?q=&page=&pageSize= (site admins): `q` matches e-mail or name. */
export const adminUserListResponseSchema = pageOf(adminUserSchema);

/**
 * PATCH /api/admin/users/:uid (site admins). A disabled account cannot sign in and its sessions
 * end at once. Admins cannot disable themselves or drop their own admin flag.
 */
export const updateAdminUserRequestSchema = z
  .strictObject({
    name: plainText(80).optional(),
    isSiteAdmin: z.boolean({ error: 'must be true or false' }).optional(),
    disabled: z.boolean({ error: 'must be true or false' }).optional(),
  })
  .refine((b) => Object.keys(b).length > 0, { error: 'give at least one of name, isSiteAdmin, disabled' });
export type UpdateAdminUserRequest = z.input<typeof updateAdminUserRequestSchema>;

export const adminUserResponseSchema = z.object({ user: adminUserSchema });

/** A message caught by the local fake mail server (development and tests only). */
export const caughtMailSchema = z.object({
  id: z.number().int(),
  receivedAt: instantSchema,
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
});
export type CaughtMail = z.infer<typeof caughtMailSchema>;

/** GET /api/admin/mail (site admins, not in production): newest first, at most 200. */
export const caughtMailListResponseSchema = z.object({ messages: z.array(caughtMailSchema) });
