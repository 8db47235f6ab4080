import { z } from 'zod';

export const ROLES = ['engineer', 'lead', 'operator', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const roleSchema = z.enum(ROLES);

export const emailSchema = z.string().trim().toLowerCase().email('Enter a valid e-mail address').max(190);
export const passwordSchema = z
  .string()
  .min(10, 'Use at least 10 characters')
  .max(200, 'Use at most 200 characters');
export const personNameSchema = z.string().trim().min(1, 'Enter a name').max(120);

/** A person as the API returns them (never the password hash). */
export interface User {
  id: number;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  createdAt: string;
  updatedAt: string;
}

/** What every signed-in person may know of the others (for filters and names). */
export interface PersonSummary {
  id: number;
  name: string;
  role: Role;
  active: boolean;
}

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, 'Enter your password').max(200),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const createUserSchema = z.object({
  email: emailSchema,
  name: personNameSchema,
  role: roleSchema,
  password: passwordSchema,
});
export type CreateUserInput = z.infer<typeof createUserSchema>;

export const patchUserSchema = z
  .object({
    name: personNameSchema,
    role: roleSchema,
    active: z.boolean(),
    password: passwordSchema,
  })
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'Change at least one field' });
export type PatchUserInput = z.infer<typeof patchUserSchema>;
