import { getRouterParam } from 'h3'
import { defineApiHandler } from '../../../utils/http/apiHandler'
import { theoryForShareToken } from '../../../utils/db/shareLinks'
import { theoryOr404, publicTheory } from '../../../utils/db/theories'
import { boardData, latestBasisOf } from '../../../utils/db/bases'
import { coverageOfClasses, type StoredClass } from '../../../utils/db/boardMath'

// Read-only view through a share link: the theory and its latest basis with tags and notes.
// There is no route that accepts a share token for writing.
export default defineApiHandler(async (event) => {
  const theoryId = await theoryForShareToken(getRouterParam(event, 'token')!)
  const theory = publicTheory(await theoryOr404(theoryId))
  const latest = await latestBasisOf(theoryId)
  const board = latest ? await boardData(latest.id) : null
  const caller = { user: `share:${theoryId}`, group: theory.groupId }
  if (board) delete (board as { groupId?: number }).groupId
  const coverage = board ? await coverageOfClasses(board.basis.id, board.basis.classes as StoredClass[], caller) : {}
  return { theory, board: board && { ...board, coverage }, role: 'share' }
})
