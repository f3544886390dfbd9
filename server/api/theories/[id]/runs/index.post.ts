import { defineApiHandler, created } from '../../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../../utils/http/readJson'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../../utils/db/theories'
import { publicRun, runPriorities, runReach } from '../../../../utils/db/runs'
import { useDb } from '../../../../utils/db/connection'
import { useQueue, RUN_QUEUE } from '../../../../utils/jobs/queue'
import { admitRun } from '../../../../utils/jobs/runLimits'
import { RunCreateSchema } from '../../../../../shared/schemas/runRequests'
import { once } from '../../../../utils/http/requestKeys'

// Editors start a background run (once per request key); the theory file is frozen into the
// run's parameters. Runs are limited per person and per group (429), and groups take turns in
// the queue (runLimits.ts).
export default defineApiHandler(async (event) => {
  const theory = await theoryOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, theory.group_id, 'editor')
  const body = await readJson(event, RunCreateSchema)
  const priorities = await runPriorities(theory.id, body.priorities)
  const params = { ...runReach(theory.definition, body), nf: body.nf, priorities, theory: theory.definition, theoryVersion: theory.version }
  return once(event, user.id, body, async () => {
    const { run, priority } = await useDb().transaction(async (trx) => {
      const priority = await admitRun(trx, theory.group_id, user.id)
      const [run] = await trx('runs')
        .insert({ theory_id: theory.id, kind: body.kind, params: JSON.stringify(params), created_by: user.id })
        .returning('*')
      return { run, priority }
    })
    const boss = await useQueue()
    const jobId = await boss.send(RUN_QUEUE, { runId: run.id }, { priority })
    await useDb()('runs').where({ id: run.id }).update({ job_id: jobId })
    created(event)
    return { run: publicRun(run) }
  })
})
