import { getQuery } from 'h3'
import { defineApiHandler } from '../../utils/http/apiHandler'
import { requireAdmin } from '../../utils/auth/currentUser'
import { useDb } from '../../utils/db/connection'

// The local fake mailbox: every message the app "sent" while no SMTP_URL was configured.
export default defineApiHandler(async (event) => {
  await requireAdmin(event)
  const to = getQuery(event).to
  const query = useDb()('outbox').orderBy('id', 'desc').limit(200).select('id', 'to_address as to', 'subject', 'text_body as text', 'created_at as createdAt')
  if (typeof to === 'string' && to) query.where('to_address', to.toLowerCase())
  return { messages: await query }
})
