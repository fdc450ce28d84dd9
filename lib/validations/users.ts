import { z } from 'zod';
import { ROLES } from '@/db/enums';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@/lib/auth/password-rules';

const password = z
  .string()
  .min(PASSWORD_MIN_LENGTH, `Passwords need at least ${PASSWORD_MIN_LENGTH} characters.`)
  .max(PASSWORD_MAX_LENGTH, `Passwords can have at most ${PASSWORD_MAX_LENGTH} characters.`);

export const createUserBodySchema = z.object({
  email: z.string().trim().toLowerCase().email('Enter a valid e-mail address.'),
  name: z.string().trim().min(1, 'Enter a name.').max(80),
  role: z.enum(ROLES, { message: 'Choose a role.' }),
  password,
});
export type CreateUserBody = z.infer<typeof createUserBodySchema>;
export type CreateUserBodyInput = z.input<typeof createUserBodySchema>;

export const updateUserBodySchema = z
  .object({
    name: z.string().trim().min(1, 'Enter a name.').max(80),
    role: z.enum(ROLES, { message: 'Choose a role.' }),
    disabled: z.boolean(),
    /** A yard hand may also use the saw screens. */
    canUseSaw: z.boolean(),
    password,
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change.');
export type UpdateUserBody = z.infer<typeof updateUserBodySchema>;
export type UpdateUserBodyInput = z.input<typeof updateUserBodySchema>;

export const changeOwnPasswordBodySchema = z
  .object({
    currentPassword: z.string().min(1, 'Enter your current password.').max(PASSWORD_MAX_LENGTH),
    newPassword: password,
  })
  .refine((v) => v.newPassword !== v.currentPassword, {
    message: 'Choose a password different from the current one.',
    path: ['newPassword'],
  });
export type ChangeOwnPasswordBody = z.infer<typeof changeOwnPasswordBodySchema>;
export type ChangeOwnPasswordBodyInput = z.input<typeof changeOwnPasswordBodySchema>;
