import { z } from 'zod';
import { lineText, text } from './text';
import { CLUB_MAX_LENGTH, EMAIL_MAX_LENGTH, HOMETOWN_MAX_LENGTH, NAME_MAX_LENGTH, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH, PAGE_SIZE_MAX } from '../constants';

export const EmailSchema = z
  .string({ error: 'E-mail is required.' })
  .trim()
  .toLowerCase()
  .max(EMAIL_MAX_LENGTH, { error: `E-mail must be at most ${EMAIL_MAX_LENGTH} characters.` })
  .pipe(z.email({ error: 'Enter a valid e-mail address.' }));

export const PasswordSchema = z
  .string({ error: 'Password is required.' })
  .min(PASSWORD_MIN_LENGTH, { error: `Password must be at least ${PASSWORD_MIN_LENGTH} characters.` })
  .max(PASSWORD_MAX_LENGTH, { error: `Password must be at most ${PASSWORD_MAX_LENGTH} characters.` });

export const NameSchema = text('Name')
  .trim()
  .min(1, { error: 'Name is required.' })
  .max(NAME_MAX_LENGTH, { error: `Name must be at most ${NAME_MAX_LENGTH} characters.` });

/** The token of the invitation link the person came from: its mail proves the invited address, so an account with that address is confirmed at once. */
export const SignUpSchema = z.object({
  email: EmailSchema,
  name: NameSchema,
  password: PasswordSchema,
  invitationToken: z.string({ error: 'The invitation link is not valid.' }).regex(/^[A-Za-z0-9_-]{20,100}$/, { error: 'The invitation link is not valid.' }).optional(),
});
export type SignUpInput = z.infer<typeof SignUpSchema>;

export const SignInSchema = z.object({
  email: EmailSchema,
  password: z.string({ error: 'Password is required.' }).min(1, { error: 'Password is required.' }).max(PASSWORD_MAX_LENGTH),
});
export type SignInInput = z.infer<typeof SignInSchema>;

/**
 * Hometown and club are optional and public: printed beside the owner's name on results and certificates.
 * Empty means "do not show"; the form sends '' for a cleared field.
 */
export const AccountUpdateSchema = z.object({
  name: NameSchema,
  hometown: lineText('Hometown', HOMETOWN_MAX_LENGTH).optional(),
  club: lineText('Club', CLUB_MAX_LENGTH).optional(),
});
export type AccountUpdateInput = z.infer<typeof AccountUpdateSchema>;

export const PasswordChangeSchema = z.object({
  currentPassword: z
    .string({ error: 'Current password is required.' })
    .min(1, { error: 'Current password is required.' })
    .max(PASSWORD_MAX_LENGTH, { error: `Password must be at most ${PASSWORD_MAX_LENGTH} characters.` }),
  newPassword: PasswordSchema,
});
export type PasswordChangeInput = z.infer<typeof PasswordChangeSchema>;

export const PasswordResetRequestSchema = z.object({ email: EmailSchema });
export type PasswordResetRequestInput = z.infer<typeof PasswordResetRequestSchema>;

export const PasswordResetConfirmSchema = z.object({
  token: z.string({ error: 'The reset link is incomplete.' }).regex(/^[A-Za-z0-9_-]{20,100}$/, { error: 'The reset link is not valid.' }),
  password: PasswordSchema,
});
export type PasswordResetConfirmInput = z.infer<typeof PasswordResetConfirmSchema>;

/** Sign-up answers the same whether or not the address has an account: the mail tells the person which. */
/** `session` is set when sign-up from an invitation made a confirmed account and signed it in. */
export const SignUpResponseSchema = z.object({ message: z.string(), demoMode: z.boolean(), session: z.lazy(() => SessionResponseSchema).nullable() });
export type SignUpResponse = z.infer<typeof SignUpResponseSchema>;

export const EmailVerificationConfirmSchema = z.object({
  token: z.string({ error: 'The confirmation link is incomplete.' }).regex(/^[A-Za-z0-9_-]{20,100}$/, { error: 'The confirmation link is not valid.' }),
});
export type EmailVerificationConfirmInput = z.infer<typeof EmailVerificationConfirmSchema>;

/** `session` is the new session when confirming signed the person in (the browser that signed up). */
export const EmailVerificationConfirmResponseSchema = z.object({ verified: z.literal(true), session: z.lazy(() => SessionResponseSchema).nullable() });
export type EmailVerificationConfirmResponse = z.infer<typeof EmailVerificationConfirmResponseSchema>;

/** What the signed-in person may do across the site; event roles add to it per event. */
export const AbilitiesSchema = z.object({
  manageAccounts: z.boolean(),
  readCaughtMail: z.boolean(),
  createEvents: z.boolean(),
});
export type Abilities = z.infer<typeof AbilitiesSchema>;

export const CurrentUserSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  /** Public by the owner's choice; '' when not given. */
  hometown: z.string(),
  club: z.string(),
  isSiteAdmin: z.boolean(),
  mayOrganise: z.boolean(),
  /** The address is confirmed; until then the person cannot register for shows or accept invitations. */
  emailVerified: z.boolean(),
  abilities: AbilitiesSchema,
});
export type CurrentUser = z.infer<typeof CurrentUserSchema>;

export const SessionResponseSchema = z.object({
  user: CurrentUserSchema.nullable(),
  csrfToken: z.string(),
  demoMode: z.boolean(),
});
export type SessionResponse = z.infer<typeof SessionResponseSchema>;

// Site admin: accounts list and role grants.
export const AdminUserSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  isSiteAdmin: z.boolean(),
  mayOrganise: z.boolean(),
  createdAt: z.string(),
  /** When a site admin disabled the account; null while it is active. */
  disabledAt: z.string().nullable(),
  lastSignInAt: z.string().nullable(),
});
export type AdminUser = z.infer<typeof AdminUserSchema>;

/** One account opened by the site admin: the row plus its builds. */
export const AdminUserDetailSchema = z.object({
  user: AdminUserSchema,
  builds: z.array(z.object({ id: z.number().int(), title: z.string(), published: z.boolean(), publicUrl: z.string(), updatedAt: z.string() })),
});
export type AdminUserDetail = z.infer<typeof AdminUserDetailSchema>;

export const AdminUserDisableSchema = z.object({ disabled: z.boolean({ error: 'Disabled must be true or false.' }) });
export type AdminUserDisableInput = z.infer<typeof AdminUserDisableSchema>;

export const AdminUserListQuerySchema = z.object({
  q: text('Search').trim().max(EMAIL_MAX_LENGTH).optional(),
  page: z.coerce.number({ error: 'Page must be a number.' }).int().min(1, { error: 'Page starts at 1.' }).default(1),
  pageSize: z.coerce.number().int().min(1).max(PAGE_SIZE_MAX, { error: `Page size is at most ${PAGE_SIZE_MAX}.` }).default(25),
});
export type AdminUserListQuery = z.infer<typeof AdminUserListQuerySchema>;

export const AdminUserListResponseSchema = z.object({
  users: z.array(AdminUserSchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
export type AdminUserListResponse = z.infer<typeof AdminUserListResponseSchema>;

export const AdminUserUpdateSchema = z
  .object({ mayOrganise: z.boolean({ error: 'May organise must be true or false.' }).optional(), isSiteAdmin: z.boolean({ error: 'Site admin must be true or false.' }).optional() })
  .refine((v) => v.mayOrganise !== undefined || v.isSiteAdmin !== undefined, { error: 'Send mayOrganise or isSiteAdmin.', path: ['mayOrganise'] });
export type AdminUserUpdateInput = z.infer<typeof AdminUserUpdateSchema>;

