import { defineApiHandler } from '../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { operatorOr404 } from '../../../utils/db/bases'
import { moveOperator } from '../../../utils/db/moves'
import { MoveSchema } from '../../../../shared/schemas/boardRequests'

// Editors move an operator between kept and set aside, or reorder a column. Moving into kept an
// operator that the kept ones already span is refused with the operators it depends on; moving
// one out answers with its rewrite in terms of those that stay. All of it is decided under the
// order's lock before the move is committed (moves.ts), so an answer never contradicts the board.
export default defineApiHandler(async (event) => {
  const op = await operatorOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, op.group_id, 'editor')
  const body = await readJson(event, MoveSchema)
  return moveOperator(op, body, user.id)
})
