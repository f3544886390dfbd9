import { describe, expect, it } from 'vitest'
import { importStatementsOf, sourceFiles, target } from '../../support/sourceImports'

// Issue 12, item 1: no route computes on the event loop. Checked on the source: the code that
// runs on the server's event loop (routes, middleware, plugins, server utilities) imports from
// the engine only its error classes and types; engine work goes through compute() and runs in
// the compute pool's threads (server/worker/*Tasks.ts). Common practice: a layer rule checked
// by reading the import statements.

/** Server utilities that only the compute threads load (through server/worker/computeTasks.ts). */
const THREAD_SIDE = new Set(['server/utils/scales/applicableMatching.ts', 'server/utils/scales/gaugeInputs.ts', 'server/utils/scales/ladderEstimates.ts', 'server/utils/scales/runningCurves.ts'])
/** Engine modules the event loop may use at run time, and why. */
const ALLOWED = new Map([
  ['server/engine/errors', 'error classes (routes map them to answers)'],
  ['server/engine/scales/pdg2024', 'constants of the data table (PDG 2024)'],
])
/** Single (file, module) pairs, each with why it is not computation. */
const EXCEPTIONS = new Map([['server/utils/db/runs.ts → server/engine/rules/defaultWeights', 'mass dimension ↔ order is d − 4, arithmetic on one number']])

const eventLoopFiles = () => ['server/api', 'server/middleware', 'server/plugins', 'server/utils'].flatMap((dir) => sourceFiles(dir)).filter((f) => !THREAD_SIDE.has(f))

describe('nothing heavy on the request thread', () => {
  it('routes, middleware, plugins and server utilities import from the engine only error classes and types', () => {
    const bad = eventLoopFiles().flatMap((f) =>
      importStatementsOf(f)
        .filter((i) => !i.typeOnly)
        .map((i) => target(f, i.spec))
        .filter((t) => t.startsWith('server/engine/') && !ALLOWED.has(t) && !EXCEPTIONS.has(`${f} → ${t}`))
        .map((t) => `${f} → ${t}`),
    )
    expect(bad).toEqual([])
  })

  it('the thread-side utilities are loaded by no route, middleware or plugin', () => {
    const bad = eventLoopFiles().flatMap((f) =>
      importStatementsOf(f)
        .filter((i) => !i.typeOnly)
        .map((i) => target(f, i.spec))
        .filter((t) => THREAD_SIDE.has(`${t}.ts`))
        .map((t) => `${f} → ${t}`),
    )
    expect(bad).toEqual([])
  })

  it('the reader tells type-only imports from run-time ones', () => {
    expect(
      importStatementsOf('server/api/theories/[id]/tower.get.ts')
        .filter((i) => i.typeOnly)
        .map((i) => i.spec),
    ).toEqual(['../../../../shared/schemas/theory'])
  })
})
