import { z } from 'zod';
import { roles } from '../permissions';
import { emailSchema, idSchema, text } from './common';

export const passwordSchema = z
  .string({ message: 'Password must be text.' })
  .min(10, 'Use at least 10 characters.')
  .max(200, 'Use at most 200 characters.');

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string({ message: 'Password is required.' }).min(1, 'Password is required.').max(200),
});

export const changePasswordSchema = z.object({
  currentPassword: z.string().min(1, 'Enter your current password.').max(200),
  newPassword: passwordSchema,
});

export const resetRequestSchema = z.object({ email: emailSchema });

export const tokenSchema = z.string().regex(/^[A-Za-z0-9_-]{20,100}$/, 'This link is not valid.');

export const resetSchema = z.object({ token: tokenSchema, newPassword: passwordSchema });

export const roleSchema = z.enum(roles, { message: `Role must be one of: ${roles.join(', ')}.` });

export const invitationCreateSchema = z.object({
  email: emailSchema,
  role: roleSchema,
  teamId: idSchema.nullable().default(null),
});

export const acceptInvitationSchema = z.object({
  name: text(120, 'Name'),
  password: passwordSchema,
});

export const userUpdateSchema = z
  .object({ role: roleSchema.optional(), active: z.boolean().optional() })
  .refine((v) => v.role !== undefined || v.active !== undefined, { message: 'Give a role or an active flag.' });

export type SignInInput = z.infer<typeof signInSchema>;
export type InvitationCreateInput = z.input<typeof invitationCreateSchema>;
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;
