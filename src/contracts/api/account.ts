import { z } from '../zod-messages';
import { currencySchema, emailSchema, idSchema, plainText, roleSchema, unitSystemSchema } from './common';

/**
 * Shortest password accepted. NIST SP 800-63B (2017), section 5.1.1.1, sets 8 characters as the
 * floor for memorized secrets (recalled from memory); 12 is our own, stricter choice.
 */
export const PASSWORD_MIN_LENGTH = 12;
/** Longest password accepted; bounds the work a single sign-in can cost the server. */
export const PASSWORD_MAX_LENGTH = 200;

export const passwordSchema = z
  .string({ error: 'must be text' })
  .min(PASSWORD_MIN_LENGTH, { error: `must be at least ${PASSWORD_MIN_LENGTH} characters` })
  .max(PASSWORD_MAX_LENGTH, { error: `must be at most ${PASSWORD_MAX_LENGTH} characters` });

/** The signed-in person as the client sees them. */
export const sessionUserSchema = z.object({
  id: idSchema,
  email: z.string(),
  name: z.string(),
  isSiteAdmin: z.boolean(),
});
export type SessionUser = z.infer<typeof sessionUserSchema>;

/** One workspace the person belongs to, with their role there. */
export const membershipSummarySchema = z.object({
  workspaceId: idSchema,
  name: z.string(),
  role: roleSchema,
  currency: currencySchema,
  unitSystem: unitSystemSchema,
});
export type MembershipSummary = z.infer<typeof membershipSummarySchema>;

/** GET /api/me: who is signed in (null when nobody), their workspaces, and the token every write must echo in X-CSRF-Token. */
export const meResponseSchema = z.object({
  user: sessionUserSchema.nullable(),
  memberships: z.array(membershipSummarySchema),
  csrfToken: z.string(),
});
export type MeResponse = z.infer<typeof meResponseSchema>;

/** POST /api/account/sign-up. The new account then signs in through /auth/callback/credentials. */
export const signUpRequestSchema = z.strictObject({
  email: emailSchema,
  password: passwordSchema,
  name: plainText(80),
});
export type SignUpRequest = z.input<typeof signUpRequestSchema>;

export const signUpResponseSchema = z.object({ user: sessionUserSchema });
export type SignUpResponse = z.infer<typeof signUpResponseSchema>;

/** POST /api/account/password. Other sessions of the account end; this one stays signed in. */
export const passwordChangeRequestSchema = z.strictObject({
  currentPassword: z.string({ error: 'must be text' }).min(1, { error: 'is required' }).max(PASSWORD_MAX_LENGTH),
  newPassword: passwordSchema,
});
export type PasswordChangeRequest = z.input<typeof passwordChangeRequestSchema>;

export const passwordChangeResponseSchema = z.object({ user: sessionUserSchema });

/**
 * The form the client posts to Auth.js at POST /auth/callback/credentials (JSON or
 * application/x-www-form-urlencoded). `csrfToken` comes from GET /auth/csrf, not from /api/me.
 */
export const credentialsSignInFormSchema = z.strictObject({
  email: emailSchema,
  password: z.string().min(1).max(PASSWORD_MAX_LENGTH),
  csrfToken: z.string().min(1),
  callbackUrl: z.string().optional(),
});
export type CredentialsSignInForm = z.input<typeof credentialsSignInFormSchema>;

/** The form that asks Auth.js to e-mail a sign-in link: POST /auth/signin/nodemailer. */
export const emailLinkFormSchema = z.strictObject({
  email: emailSchema,
  csrfToken: z.string().min(1),
  callbackUrl: z.string().optional(),
});
export type EmailLinkForm = z.input<typeof emailLinkFormSchema>;

/** Auth.js's reply to a POST sent with the header `X-Auth-Return-Redirect: 1`: where to go next. */
export const authRedirectResponseSchema = z.object({ url: z.string() });
