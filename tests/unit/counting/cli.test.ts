import { spawnSync } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'

const root = join(__dirname, '../../..')
const run = (...args: string[]) =>
  spawnSync(process.execPath, ['--import', 'tsx', 'scripts/count.ts', ...args], { cwd: root, encoding: 'utf8', timeout: 60_000 })

describe('count CLI', () => {
  it('prints only JSON for a preset: SMEFT, one flavor, dim 5 → 2, dim 6 → 84 (Henning, Lu, Melia, Murayama, JHEP 08 (2017) 016)', () => {
    const r = run('smeft', '--max-dim', '6', '--nf', '1')
    expect(r.status).toBe(0)
    const out = JSON.parse(r.stdout)
    expect(out.theory).toBe('SMEFT')
    expect(out.byDimension.map((d: { operators: number }) => d.operators)).toEqual([2, 84])
    expect(out.byDimension[1].classes['H^3 H*^3']).toBe(1)
    expect(Object.keys(out.byDimension[0]).sort()).toEqual(['classes', 'dimension', 'operators'])
  })

  it('reads a theory file: photons only, dim 8 → 3 (Heisenberg & Euler, Z. Phys. 98 (1936) 714)', () => {
    const r = run(join(root, 'shared/presets/photons.json'), '--max-dim', '8')
    expect(r.status).toBe(0)
    expect(JSON.parse(r.stdout).byDimension.at(-1).operators).toBe(3)
  })

  it('bad file or arguments: message on stderr, exit code 2, nothing on stdout', () => {
    const dir = mkdtempSync(join(tmpdir(), 'count-cli-'))
    const bad = join(dir, 'bad.json')
    writeFileSync(bad, JSON.stringify({ name: 'x', frame: 'relativistic', groups: [], fields: [{ name: 'phi', lorentz: 'S', real: true, charges: { Y: '1/3' } }] }))
    const r = run(bad, '--max-dim', '6')
    expect(r.status).toBe(2)
    expect(r.stdout).toBe('')
    expect(r.stderr).toContain('fields[0] "phi": unknown group Y')
    const missing = run('no-such-theory', '--max-dim', '6')
    expect([missing.status, missing.stdout]).toEqual([2, ''])
    expect(missing.stderr).toContain('no such theory file or preset: no-such-theory')
    const noDim = run('smeft')
    expect([noDim.status, noDim.stdout]).toEqual([2, ''])
    expect(noDim.stderr).toContain('--max-dim is required')
  })
})
