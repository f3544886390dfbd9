import { spawnSync } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import nerdamer from 'nerdamer'

const root = join(__dirname, '../../..')
const run = (...args: string[]) => spawnSync(process.execPath, ['--import', 'tsx', 'scripts/match.ts', ...args], { cwd: root, encoding: 'utf8', timeout: 60_000 })

// A heavy real singlet S with L ⊃ k·S·H†H: integrating it out shifts the |H|⁴ coupling by
// +k²/(2M²) (hand derivation in tests/unit/matching/treeScalarExchange.test.ts; common practice).
const uv = {
  name: 'singlet',
  frame: 'relativistic',
  groups: [{ name: 'Y', type: 'U1', gauge: true }],
  fields: [
    { name: 'H', lorentz: 'scalar', charges: { Y: '1/2' } },
    { name: 'S', lorentz: 'scalar', real: true, mass: { symbol: 'M', value: { number: '3', unit: 'TeV' } } },
    { name: 'B', lorentz: 'field-strength', gaugeOf: 'Y' },
  ],
  couplings: [
    { class: 'S H H*', symbol: 'k' },
    { class: 'H^2 H*^2', symbol: 'lambda' },
  ],
}
const file = () => {
  const dir = mkdtempSync(join(tmpdir(), 'match-cli-'))
  writeFileSync(join(dir, 'uv.json'), JSON.stringify(uv))
  return join(dir, 'uv.json')
}

describe('match CLI', () => {
  it('prints the child and the order-0 change of the quartic, as nerdamer-parsable text', () => {
    const r = run(file(), '--heavy', 'S', '--max-dim', '6')
    expect(r.status, r.stderr).toBe(0)
    const out = JSON.parse(r.stdout)
    expect(out.child.fields.map((f: { name: string }) => f.name)).toEqual(['H', 'B'])
    expect(out.child.couplings).toEqual([{ class: 'H^2 H*^2', symbol: 'lambda' }])
    expect(out.coefficients).toHaveLength(1)
    const c = out.coefficients[0]
    expect(c).toMatchObject({ dimension: 4, class: 'H^2 H*^2', text: '1', orderZeroChange: true })
    expect(nerdamer(`(${c.coefficient}) - k^2/(2*M^2)`).expand().toString()).toBe('0')
    expect(out.orderZero).toMatch(/changes of those couplings, not new totals/)
    expect(out.notComputed.some((n: string) => n.startsWith('classes with derivatives'))).toBe(true)
  })

  it('bad arguments: message on stderr, exit code 2, nothing on stdout', () => {
    for (const args of [
      [file(), '--max-dim', '6'],
      [file(), '--heavy', 'S,H', '--max-dim', '6'],
      [file(), '--heavy', 'H', '--max-dim', '6'],
      ['nope.json', '--heavy', 'S', '--max-dim', '6'],
    ]) {
      const r = run(...args)
      expect(r.status).toBe(2)
      expect(r.stdout).toBe('')
      expect(r.stderr).toMatch(/^match: /)
    }
  })
})
