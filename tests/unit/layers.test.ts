import { readdirSync, readFileSync } from 'node:fs'
import { dirname, join, relative, resolve } from 'node:path'
import { describe, expect, it } from 'vitest'

// The layers of DEVELOPERS.md, checked on the source: shared/ (schemas, presets, pure helpers)
// imports nothing from server/ or the app, and the engine imports only itself and shared/.
// Common practice: import rules checked by reading the import statements.
const root = resolve(__dirname, '../..')

function sourceFiles(dir: string): string[] {
  return readdirSync(join(root, dir), { withFileTypes: true }).flatMap((e) => {
    const path = join(dir, e.name)
    if (e.isDirectory()) return sourceFiles(path)
    return /\.(ts|vue)$/.test(e.name) ? [path] : []
  })
}

/** Every module a file imports or re-exports, as written. */
function importsOf(file: string): string[] {
  const text = readFileSync(join(root, file), 'utf8')
  return [...text.matchAll(/(?:^|\n)\s*(?:import|export)\b[^'"]*?\bfrom\s*['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g)].map((m) => (m[1] ?? m[2])!)
}

/** Repository folder an import lands in ('server/engine', 'shared', …), or the package name. */
function target(file: string, spec: string): string {
  if (spec.startsWith('#shared/')) return `shared/${spec.slice('#shared/'.length)}`
  if (spec.startsWith('~/') || spec.startsWith('@/')) return spec.slice(2)
  if (!spec.startsWith('.')) return `package:${spec}`
  return relative(root, resolve(root, dirname(file), spec))
}

describe('layers', () => {
  it('shared/ imports nothing from server/ or from the app', () => {
    const bad = sourceFiles('shared').flatMap((f) => importsOf(f).map((s) => [f, target(f, s)] as const))
      .filter(([, t]) => /^(server|components|pages|composables|stores|layouts|middleware)\//.test(t))
    expect(bad).toEqual([])
  })

  it('the engine imports only the engine and shared/ (no Vue, Nitro, Knex or other packages)', () => {
    const bad = sourceFiles('server/engine').flatMap((f) => importsOf(f).map((s) => [f, target(f, s)] as const))
      .filter(([, t]) => !t.startsWith('server/engine/') && !t.startsWith('shared/'))
    expect(bad).toEqual([])
  })

  it('the import reader sees the imports it must judge', () => {
    expect(importsOf('server/engine/theory/parseTheory.ts').map((s) => target('server/engine/theory/parseTheory.ts', s)))
      .toEqual(['server/engine/errors', 'shared/schemas/theory'])
  })
})
