import { z } from 'zod';
import './messages';

export const SignInSchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email('Enter an e-mail address')),
  password: z.string().min(1, 'Enter your password').max(200),
});
export type SignInInput = z.input<typeof SignInSchema>;

export const AuditQuerySchema = z.object({
  entity: z.string().trim().min(1).max(40).optional(),
  entityId: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(500).default(100),
});
