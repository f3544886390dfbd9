import { defineApiHandler } from '../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { basisOr404 } from '../../../utils/db/bases'
import { importChoice } from '../../../utils/db/importChoice'
import { ImportChoiceSchema, IMPORT_MAX_BYTES } from '../../../../shared/schemas/importChoice'

// Editors apply a JSON export to the basis, all or nothing: columns and places, tags and notes
// (matched by order, class and operator text; see importChoice.ts for what is refused).
export default defineApiHandler(async (event) => {
  const basis = await basisOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, basis.group_id, 'editor')
  const body = await readJson(event, ImportChoiceSchema, IMPORT_MAX_BYTES)
  return importChoice(basis, body, user.id)
})
