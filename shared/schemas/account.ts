import { z } from 'zod'
import './zodMessages'

// Account forms, validated identically in the browser and on the server.
export const EmailSchema = z
  .string({ error: 'Enter your e-mail address' })
  .trim()
  .toLowerCase()
  .max(254, { error: 'E-mail address is too long (254 characters at most)' })
  .pipe(z.email({ error: 'Enter a valid e-mail address' }))
export const PasswordSchema = z
  .string({ error: 'Password is required' })
  .min(10, { error: 'Password must have at least 10 characters' })
  .max(200, { error: 'Password must have at most 200 characters' })

export const SignUpSchema = z
  .object({
    email: EmailSchema,
    password: PasswordSchema,
    displayName: z.string({ error: 'Name is required' }).trim().min(1, { error: 'Name is required' }).max(80, { error: 'Name must have at most 80 characters' }),
    invitation: z.string().max(100).optional(),
  })
  .strict()

const SIGN_UP_LINK = 'This sign-up link is incomplete; open the link from the e-mail again'

export const SignUpConfirmSchema = z
  .object({
    token: z.string({ error: SIGN_UP_LINK }).min(20, { error: SIGN_UP_LINK }).max(100, { error: SIGN_UP_LINK }),
  })
  .strict()

export const SignInSchema = z
  .object({
    email: EmailSchema,
    password: z.string({ error: 'Password is required' }).min(1, { error: 'Password is required' }).max(200),
  })
  .strict()

const RESET_LINK = 'This reset link is incomplete; open the link from the e-mail again'

export const ResetRequestSchema = z.object({ email: EmailSchema }).strict()
export const ResetSchema = z
  .object({
    token: z.string({ error: RESET_LINK }).min(20, { error: RESET_LINK }).max(100, { error: RESET_LINK }),
    password: PasswordSchema,
  })
  .strict()

export const ChangePasswordSchema = z
  .object({
    current: z.string({ error: 'The current password is required' }).min(1, { error: 'The current password is required' }).max(200),
    password: PasswordSchema,
  })
  .strict()
