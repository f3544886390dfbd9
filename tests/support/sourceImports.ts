import { readdirSync, readFileSync } from 'node:fs'
import { dirname, join, relative, resolve } from 'node:path'

// Reading a source tree's import statements, for the tests that check layers (common practice:
// import rules checked by reading the import statements).
export const root = resolve(__dirname, '../..')

export function sourceFiles(dir: string): string[] {
  return readdirSync(join(root, dir), { withFileTypes: true }).flatMap((e) => {
    const path = join(dir, e.name)
    if (e.isDirectory()) return sourceFiles(path)
    return /\.(ts|vue)$/.test(e.name) ? [path] : []
  })
}

/** Every module a file imports or re-exports, as written; `typeOnly` for `import type …`. */
export function importStatementsOf(file: string): { spec: string; typeOnly: boolean }[] {
  const text = readFileSync(join(root, file), 'utf8')
  return [...text.matchAll(/(?:^|\n)\s*((?:import|export)\b[^'"]*?)\bfrom\s*['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g)].map((m) => ({
    spec: (m[2] ?? m[3])!,
    typeOnly: /^(?:import|export)\s+type\b/.test(m[1] ?? ''),
  }))
}

/** Every module a file imports or re-exports, as written. */
export function importsOf(file: string): string[] {
  return importStatementsOf(file).map((i) => i.spec)
}

/** Repository folder an import lands in ('server/engine', 'shared', …), or the package name. */
export function target(file: string, spec: string): string {
  if (spec.startsWith('#shared/')) return `shared/${spec.slice('#shared/'.length)}`
  if (spec.startsWith('~/') || spec.startsWith('@/')) return spec.slice(2)
  if (!spec.startsWith('.')) return `package:${spec}`
  return relative(root, resolve(root, dirname(file), spec))
}
