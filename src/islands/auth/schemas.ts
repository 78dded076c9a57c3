import { z } from 'zod';

export const emailField = z.string().trim().min(1, 'Enter your e-mail address.').pipe(z.email('Enter a valid e-mail address.'));

export const newPasswordField = z
  .string()
  .min(1, 'Enter a password.')
  .min(8, 'The password must be at least 8 characters.')
  .max(128, 'The password can be at most 128 characters.');

export const nameField = z.string().trim().min(1, 'Enter your name.').max(100, 'Keep the name under 100 characters.');

export const signInSchema = z.object({
  email: emailField,
  password: z.string().min(1, 'Enter your password.'),
});

export const signUpSchema = z.object({
  name: nameField,
  email: emailField,
  password: newPasswordField,
});

export const forgotSchema = z.object({ email: emailField });

export const resetSchema = z
  .object({
    password: newPasswordField,
    confirm: z.string().min(1, 'Repeat the new password.'),
  })
  .refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'The two passwords differ.' });
