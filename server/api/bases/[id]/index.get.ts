import { setResponseHeader } from 'h3'
import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole, requireRoleOn } from '../../../utils/auth/currentUser'
import { basisOr404, boardData } from '../../../utils/db/bases'
import { coverageOfClasses, type StoredClass } from '../../../utils/db/boardMath'
import { cachedBoard, storeBoard } from '../../../utils/db/boardCache'
import { acceptsGzip } from '../../../utils/http/acceptsGzip'

// The board's data, served from a per-version cache (see boardCache.ts), gzip-compressed for
// clients that accept it (browsers do); the role is per reader.
// The basis, the account and the membership come in one query on this hot path.
export default defineApiHandler(async (event) => {
  const id = intParam(event, 'id')
  let access = await requireRoleOn(event, 'bases', id, 'viewer')
  if (!access) {
    const basis = await basisOr404(id) // 404 when the basis is missing …
    const { user, role } = await requireGroupRole(event, basis.group_id, 'viewer') // … else 401/403
    access = { row: basis, user, role }
  }
  const version = access.row.version as number
  let bytes = cachedBoard(id, version, access.role)
  if (!bytes) {
    const { groupId: _g, ...data } = await boardData(id)
    storeBoard(id, version, JSON.stringify({ ...data, coverage: await coverageOfClasses(id, data.basis.classes as StoredClass[], { user: access.user.id, group: access.row.group_id as number }) }))
    bytes = cachedBoard(id, version, access.role)!
  }
  setResponseHeader(event, 'content-type', 'application/json; charset=utf-8')
  setResponseHeader(event, 'vary', 'accept-encoding')
  if (!acceptsGzip(event)) return bytes.plain
  setResponseHeader(event, 'content-encoding', 'gzip')
  return bytes.gzip
})
