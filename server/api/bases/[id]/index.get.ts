import { setResponseHeader } from 'h3'
import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { basisOr404, boardData } from '../../../utils/db/bases'
import { coverageOfClasses } from '../../../utils/db/boardMath'
import { cachedBoard, storeBoard } from '../../../utils/db/boardCache'

// The board's data, served from a per-version cache (see boardCache.ts); the role is per reader.
export default defineApiHandler(async (event) => {
  const id = intParam(event, 'id')
  const basis = await basisOr404(id)
  const { role } = await requireGroupRole(event, basis.group_id, 'viewer')
  let json = cachedBoard(id, basis.version)
  if (!json) {
    const { groupId: _g, ...data } = await boardData(id)
    json = JSON.stringify({ ...data, coverage: await coverageOfClasses(id, data.basis.classes as { key: string, rank: number }[]) })
    storeBoard(id, basis.version, json)
  }
  setResponseHeader(event, 'content-type', 'application/json; charset=utf-8')
  return `{"role":${JSON.stringify(role)},${json.slice(1)}`
})
