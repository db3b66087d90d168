import { z } from 'zod';

export const signInSchema = z.object({
  email: z.email({ message: 'Enter the e-mail address you sign in with.' }).max(254),
  password: z.string().min(1, { message: 'Enter your password.' }).max(200),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const signUpSchema = z.object({
  name: z.string().trim().min(2, { message: 'Enter your name (2 to 100 characters).' }).max(100),
  email: z.email({ message: 'Enter a valid e-mail address.' }).max(254),
  password: z.string().min(10, { message: 'Use at least 10 characters.' }).max(200),
  company: z.string().trim().min(2, { message: 'Enter your company name (2 to 120 characters).' }).max(120),
  site: z.string().trim().max(120).optional(),
});
export type SignUpInput = z.infer<typeof signUpSchema>;
