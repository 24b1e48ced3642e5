import { z } from 'zod';

export const ROLES = ['tech', 'estimator', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const SignInSchema = z.object({
  email: z.string().trim().toLowerCase().email({ error: 'Enter a valid e-mail address.' }),
  password: z.string().min(1, { error: 'Enter your password.' }).max(200),
});
export type SignIn = z.infer<typeof SignInSchema>;

export const PasswordSchema = z.string().min(10, { error: 'Use at least 10 characters.' }).max(200);

export const UserCreateSchema = z.object({
  email: z.string().trim().toLowerCase().email({ error: 'Enter a valid e-mail address.' }),
  name: z.string().trim().min(1, { error: 'Enter a name.' }).max(120),
  role: z.enum(ROLES),
  password: PasswordSchema,
});
export type UserCreate = z.infer<typeof UserCreateSchema>;

export const UserPatchSchema = z
  .object({
    name: z.string().trim().min(1).max(120).optional(),
    role: z.enum(ROLES).optional(),
    active: z.boolean().optional(),
    password: PasswordSchema.optional(),
  })
  .strict();
export type UserPatch = z.infer<typeof UserPatchSchema>;

export const PasswordChangeSchema = z.object({
  currentPassword: z.string().min(1, { error: 'Enter your current password.' }),
  newPassword: PasswordSchema,
});

export interface PublicUser {
  id: number;
  email: string;
  name: string;
  role: Role;
  active?: boolean;
}

export interface SignInResponse {
  token: string;
  user: PublicUser;
}

/** Which roles may use what (DESIGN.md §1): the app's navigation and the server's guards read this. */
export const ROLE_RANK: Record<Role, number> = { tech: 0, estimator: 1, admin: 2 };
export function roleAtLeast(role: Role, min: Role): boolean {
  return ROLE_RANK[role] >= ROLE_RANK[min];
}
