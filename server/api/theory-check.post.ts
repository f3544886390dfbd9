import { defineApiHandler, fail } from '../utils/http/apiHandler'
import { readJson } from '../utils/http/readJson'
import { requireUser } from '../utils/auth/currentUser'
import { TheorySchema, formatTheoryIssues } from '../../shared/schemas/theory'
import { TheoryCheckSchema, type TheoryCheckReply, type AnomalyFailure } from '../../shared/schemas/theoryCheck'
import { compute } from '../utils/compute/computePool'

// The editor's live check: validate the theory file (400 naming the field at fault) and list
// the gauge-anomaly conditions its chiral fermions fail, with their exact sums; its couplings
// must name kept order-0 operators (422 naming the one that is not).
export default defineApiHandler(async (event): Promise<TheoryCheckReply> => {
  const user = await requireUser(event)
  const { theory } = await readJson(event, TheoryCheckSchema)
  const parsed = TheorySchema.safeParse(theory)
  if (!parsed.success) fail(400, formatTheoryIssues(theory, parsed.error.issues))
  // A coupling on an operator the order-0 basis does not have: 422 naming it.
  if (parsed.data!.couplings?.length) await compute('couplings', parsed.data!, user.id)
  const conditions = await compute('anomalies', parsed.data!, user.id)
  const anomalies = conditions.filter((c) => !c.ok) as AnomalyFailure[]
  const issues = anomalies.map((a) => (a.name.endsWith('Witten') ? `${a.name}: ${a.sum} is odd (must be even)` : `${a.name}: sum ${a.sum} (must vanish)`)).join('\n')
  return { ok: anomalies.length === 0, issues, anomalies, checked: conditions.length }
})
