import { describe, expect, it } from 'vitest'
import { importsOf, sourceFiles, target } from '../support/sourceImports'

// The layers of DEVELOPERS.md, checked on the source: shared/ (schemas, presets, pure helpers)
// imports nothing from server/ or the app, and the engine imports only itself and shared/.
// Common practice: import rules checked by reading the import statements.
describe('layers', () => {
  it('shared/ imports nothing from server/ or from the app', () => {
    const bad = sourceFiles('shared')
      .flatMap((f) => importsOf(f).map((s) => [f, target(f, s)] as const))
      .filter(([, t]) => /^(server|components|pages|composables|stores|layouts|middleware)\//.test(t))
    expect(bad).toEqual([])
  })

  it('the engine imports only the engine and shared/ (no Vue, Nitro, Knex or other packages)', () => {
    const bad = sourceFiles('server/engine')
      .flatMap((f) => importsOf(f).map((s) => [f, target(f, s)] as const))
      .filter(([, t]) => !t.startsWith('server/engine/') && !t.startsWith('shared/'))
    expect(bad).toEqual([])
  })

  it('the import reader sees the imports it must judge', () => {
    expect(importsOf('server/engine/theory/parseTheory.ts').map((s) => target('server/engine/theory/parseTheory.ts', s))).toEqual(['server/engine/errors', 'shared/schemas/theory'])
  })
})
