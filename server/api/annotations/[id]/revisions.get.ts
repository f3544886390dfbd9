import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { annotationOr404 } from '../../../utils/db/annotations'
import { useDb } from '../../../utils/db/connection'

// A note's edit history: each earlier text, who replaced it and when.
export default defineApiHandler(async (event) => {
  const note = await annotationOr404(intParam(event, 'id'))
  await requireGroupRole(event, note.group_id, 'viewer')
  const revisions = await useDb()('annotation_revisions as r')
    .leftJoin('users as u', 'u.id', 'r.edited_by')
    .where('r.annotation_id', note.id)
    .orderBy('r.edited_at')
    .select('r.id', 'r.body', 'r.edited_at as editedAt', 'u.display_name as editedBy')
  return { revisions }
})
