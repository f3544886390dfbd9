import { z } from 'zod'
import { RoleSchema } from './group'

export const ShareLinkCreateSchema = z.object({
  expiresInDays: z.number({ error: 'expiresInDays must be a number of days' }).int({ error: 'expiresInDays must be a whole number' })
    .min(1, { error: 'expiresInDays must be at least 1' }).max(365, { error: 'expiresInDays must be at most 365' }).optional(),
}).strict()

export const InvitationCreateSchema = z.object({
  email: z.string({ error: 'email: required' }).trim().toLowerCase().pipe(z.email({ error: 'email: enter a valid e-mail address' })),
  role: RoleSchema,
}).strict()

export const InvitationAcceptSchema = z.object({
  token: z.string({ error: 'token: required' }).min(20, { error: 'token is malformed' }).max(100, { error: 'token is malformed' }),
}).strict()
