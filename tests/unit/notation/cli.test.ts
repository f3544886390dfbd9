import { spawnSync } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'

const dir = mkdtempSync(join(tmpdir(), 'check-basis-'))
const ops = (name: string, lines: string[]): string => {
  const f = join(dir, name)
  writeFileSync(f, lines.join('\n'))
  return f
}
const run = (...args: string[]) => spawnSync(process.execPath, ['--import', 'tsx', 'scripts/checkBasis.ts', 'tests/unit/basis/fixtures/smeft.json', ...args], { encoding: 'utf8', timeout: 120_000 })
const WEINBERG = '\\varepsilon_{jk}\\varepsilon_{mn}(l^j)^T C l^m \\varphi^k \\varphi^n'

describe('command line: npm run check-basis (dimension 5 of the SM: the Weinberg operator, Weinberg, PRL 43 (1979) 1566)', () => {
  it('prints complete, independent, rank, required, missing, redundant and translation as JSON', () => {
    const r = run('--order', '1', '--operators', ops('w.txt', ['% dimension five', WEINBERG]), '--alias', 'varphi=H')
    expect(r.stderr).toBe('')
    const out = JSON.parse(r.stdout)
    expect(Object.keys(out).slice(0, 7)).toEqual(['complete', 'independent', 'rank', 'required', 'missing', 'redundant', 'translation'])
    expect([out.complete, out.independent, out.rank, out.required]).toEqual([true, true, 2, 2]) // the operator and its h.c.
  })
  it('an empty list is incomplete and names the missing operators; a repeated one is redundant with factor 2', () => {
    const twice = JSON.parse(run('--dim', '5', '--operators', ops('t.txt', [WEINBERG, `2 ${WEINBERG}`]), '--alias', 'varphi=H').stdout)
    expect(twice.independent).toBe(false)
    expect(twice.redundant[0].relation).toEqual([{ operator: WEINBERG, coefficient: '2' }])
    const r = run('--dim', '5', '--operators', ops('e.txt', ['# nothing']))
    expect(r.status).toBe(1)
    expect(r.stderr).toMatch(/The list is empty/)
  })
  it('exports the translation as CSV, and points at a token it cannot read', () => {
    const csv = run('--dim', '5', '--operators', ops('c.txt', [WEINBERG]), '--alias', 'varphi=H', '--format', 'csv').stdout
    expect(csv.split('\n')[0]).toMatch(/^operator,times i,L\^2 H\^2 \| /)
    const bad = run('--dim', '5', '--operators', ops('b.txt', ['(l^j)^T C l^m X^k H^n']))
    expect(bad.status).toBe(1)
    expect(bad.stderr).toMatch(/position 15 .*"X" is not a field of this theory/)
  })
})
