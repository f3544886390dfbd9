import { z } from 'zod'
import './zodMessages'
import { RoleSchema } from './group'

export const ShareLinkCreateSchema = z
  .object({
    expiresInDays: z
      .number({ error: 'must be a whole number of days' })
      .int({ error: 'must be a whole number of days' })
      .min(1, { error: 'must be at least 1' })
      .max(365, { error: 'must be at most 365' })
      .optional(),
  })
  .strict()

export const InvitationCreateSchema = z
  .object({
    email: z
      .string({ error: 'Enter the e-mail address to invite' })
      .trim()
      .toLowerCase()
      .max(254, { error: 'E-mail address is too long (254 characters at most)' })
      .pipe(z.email({ error: 'Enter a valid e-mail address' })),
    role: RoleSchema,
  })
  .strict()

const INVITATION_LINK = 'This invitation link is incomplete; open the link from the e-mail again'

export const InvitationAcceptSchema = z
  .object({
    token: z.string({ error: INVITATION_LINK }).min(20, { error: INVITATION_LINK }).max(100, { error: INVITATION_LINK }),
  })
  .strict()
