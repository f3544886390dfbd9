import { z } from 'zod'
import './zodMessages'
import { GROUP_ROLES } from '../types/roles'

export const SlugSchema = z
  .string({ error: 'Short name is required' })
  .trim()
  .toLowerCase()
  .regex(/^[a-z][a-z0-9-]{1,46}[a-z0-9]$/, { error: 'Short name: 3–48 lower-case letters, digits or hyphens, starting with a letter' })

export const GroupCreateSchema = z
  .object({
    slug: SlugSchema,
    name: z.string({ error: 'Name is required' }).trim().min(1, { error: 'Name is required' }).max(120, { error: 'Name must have at most 120 characters' }),
    description: z.string().max(2000, { error: 'Description must have at most 2000 characters' }).optional(),
  })
  .strict()

export const RoleSchema = z.enum(GROUP_ROLES, { error: `Role must be one of ${GROUP_ROLES.join(', ')}` })

export const MemberRoleSchema = z.object({ role: RoleSchema }).strict()
