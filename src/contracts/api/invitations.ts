import { z } from '../zod-messages';
import { emailSchema, idSchema, instantSchema, roleSchema, userRefSchema } from './common';
import { membershipSummarySchema } from './account';

/** Days an invitation link stays valid. */
export const INVITATION_VALID_DAYS = 7;

export const invitationStatusSchema = z.enum(['pending', 'accepted', 'revoked', 'expired']);
export type InvitationStatus = z.infer<typeof invitationStatusSchema>;

/** An invitation as owners see it. The link's secret is only ever in the e-mail. */
export const invitationSchema = z.object({
  id: idSchema,
  workspaceId: idSchema,
  email: z.string(),
  role: roleSchema,
  status: invitationStatusSchema,
  invitedBy: userRefSchema,
  createdAt: instantSchema,
  expiresAt: instantSchema,
  acceptedAt: instantSchema.nullable(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** GET /api/workspaces/:wid/invitations (owners). */
export const invitationListResponseSchema = z.object({ invitations: z.array(invitationSchema) });

/** POST /api/workspaces/:wid/invitations (owners): e-mails a link valid for 7 days, for one use. */
export const createInvitationRequestSchema = z.strictObject({ email: emailSchema, role: roleSchema });
export type CreateInvitationRequest = z.input<typeof createInvitationRequestSchema>;

export const invitationResponseSchema = z.object({ invitation: invitationSchema });

/**
 * The secret from an invitation link (`/invitations/<token>` in the e-mail): 43 characters of
 * base64url, 256 random bits.
 */
export const invitationTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, { error: 'is not an invitation link' });

/** GET /api/invitations/:token: what the link offers, shown before accepting; anyone holding the link may read it. */
export const invitationPreviewSchema = z.object({
  workspaceName: z.string(),
  role: roleSchema,
  email: z.string(),
  invitedByName: z.string(),
  status: invitationStatusSchema,
  expiresAt: instantSchema,
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

/** POST /api/invitations/:token/accept: signed in as the invited address; joins the workspace. */
export const acceptInvitationResponseSchema = z.object({ membership: membershipSummarySchema });
