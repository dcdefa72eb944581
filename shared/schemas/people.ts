import { z } from 'zod';
import './messages';
import { ROLES } from '../domain/roles';
import { requiredText } from './common';

/** Contract: passwords have at least 12 characters. bcrypt reads only the first 72 bytes. */
const utf8Bytes = (value: string) => new TextEncoder().encode(value).length;
export const PASSWORD_MIN = 12;
export const PASSWORD_MAX = 72;

export const passwordSchema = z
  .string()
  .min(PASSWORD_MIN, `At least ${PASSWORD_MIN} characters`)
  .max(PASSWORD_MAX, `At most ${PASSWORD_MAX} characters`)
  .refine((value) => utf8Bytes(value) <= PASSWORD_MAX, {
    message: `At most ${PASSWORD_MAX} bytes`,
  });

const email = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, 'At most 254 characters')
  .pipe(z.email('Enter an e-mail address'));

/** The first admin, made on the server's command line (`npm run create-admin`). */
export const FirstAdminSchema = z
  .object({ email, name: requiredText(120, 'Name'), password: passwordSchema })
  .strict();
export type FirstAdminInput = z.input<typeof FirstAdminSchema>;

export const InvitationCreateSchema = z.object({ email, role: z.enum(ROLES) }).strict();
export type InvitationCreateInput = z.input<typeof InvitationCreateSchema>;

export const InvitationAcceptSchema = z
  .object({ name: requiredText(120, 'Name'), password: passwordSchema })
  .strict();
export type InvitationAcceptInput = z.input<typeof InvitationAcceptSchema>;

export const PasswordResetRequestSchema = z.object({ email }).strict();
export type PasswordResetRequestInput = z.input<typeof PasswordResetRequestSchema>;

export const PasswordResetSchema = z.object({ password: passwordSchema }).strict();
export type PasswordResetInput = z.input<typeof PasswordResetSchema>;

export const PasswordChangeSchema = z
  .object({
    currentPassword: z.string().min(1, 'Enter your current password').max(200),
    newPassword: passwordSchema,
  })
  .strict();
export type PasswordChangeInput = z.input<typeof PasswordChangeSchema>;

export const UserUpdateSchema = z
  .object({ role: z.enum(ROLES).optional(), active: z.boolean().optional() })
  .strict()
  .refine((value) => value.role !== undefined || value.active !== undefined, {
    message: 'Give a role or active',
  });
export type UserUpdateInput = z.input<typeof UserUpdateSchema>;

/** Tokens are 32 random bytes in base64url: 43 characters. */
export const TokenParamsSchema = z.object({
  token: z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'Not a valid link'),
});
