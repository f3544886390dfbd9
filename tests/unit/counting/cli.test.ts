import { spawnSync } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'

const root = join(__dirname, '../../..')
const run = (...args: string[]) => spawnSync(process.execPath, ['--import', 'tsx', 'scripts/count.ts', ...args], { cwd: root, encoding: 'utf8', timeout: 60_000 })

describe('count CLI', () => {
  it('prints only JSON for a preset: SMEFT, one flavor, dim 5 → 2, dim 6 → 84 (Henning, Lu, Melia, Murayama, JHEP 08 (2017) 016)', () => {
    const r = run('smeft', '--max-dim', '6', '--nf', '1')
    expect(r.status).toBe(0)
    const out = JSON.parse(r.stdout)
    expect(out.theory).toBe('SMEFT')
    expect(out.byDimension.map((d: { operators: number }) => d.operators)).toEqual([2, 84])
    expect(out.byDimension[1].classes['H^3 H*^3']).toBe(1)
    expect(Object.keys(out.byDimension[0]).sort()).toEqual(['classes', 'cp', 'cpEven', 'cpOdd', 'dimension', 'operators'])
    // CP split (Alonso, Jenkins, Manohar, Trott, JHEP 04 (2014) 159: 53 + 23, plus 4 + 4 baryon-number violating)
    expect([out.byDimension[1].cpEven, out.byDimension[1].cpOdd]).toEqual([57, 27])
    expect(out.cpConvention).toMatch(/^CP maps each field to its conjugate/)
  })

  it('reads a theory file: photons only, dim 8 → 3 (Heisenberg & Euler, Z. Phys. 98 (1936) 714)', () => {
    const r = run(join(root, 'shared/presets/photons.json'), '--max-dim', '8')
    expect(r.status).toBe(0)
    expect(JSON.parse(r.stdout).byDimension.at(-1).operators).toBe(3)
  })

  it('bad file or arguments: message on stderr, exit code 2, nothing on stdout', () => {
    const dir = mkdtempSync(join(tmpdir(), 'count-cli-'))
    const bad = join(dir, 'bad.json')
    writeFileSync(bad, JSON.stringify({ name: 'x', frame: 'relativistic', groups: [], fields: [{ name: 'phi', lorentz: 'scalar', real: true, charges: { Y: '1/3' } }] }))
    const r = run(bad, '--max-dim', '6')
    expect(r.status).toBe(2)
    expect(r.stdout).toBe('')
    expect(r.stderr).toContain('Field 1 "phi", charge under Y: the theory has no symmetry named "Y"')
    const missing = run('no-such-theory', '--max-dim', '6')
    expect([missing.status, missing.stdout]).toEqual([2, ''])
    expect(missing.stderr).toContain('no such theory file or preset: no-such-theory')
    const noDim = run('smeft')
    expect([noDim.status, noDim.stdout]).toEqual([2, ''])
    expect(noDim.stderr).toContain('--max-dim or --max-order is required')
  })

  it('--max-order on a relativistic theory is the dimension minus 4: SMEFT order 2 = dimension 6 → 84 (Henning, Lu, Melia, Murayama, JHEP 08 (2017) 016)', () => {
    const r = run('smeft', '--max-order', '2', '--nf', '1')
    expect(r.status).toBe(0)
    const out = JSON.parse(r.stdout)
    expect(out.byOrder.map((o: { order: number; dimension: number; operators: number }) => [o.order, o.dimension, o.operators])).toEqual([
      [1, 5, 2],
      [2, 6, 84],
    ])
    expect(out.byOrder[1].classes).toContainEqual({ key: 'H^3 H*^3', count: 1 })
  })

  it('a heavy-frame theory counts in orders of 1/m: vexonium to 1/m³ gives 2, 2, 7 ψ-bilinears (Manohar, Phys. Rev. D 56 (1997) 230), χ copies with no free parameter, 2 four-fermion operators at 1/m² (Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125)', () => {
    const r = run('heavy-vexonium', '--max-order', '3')
    expect(r.status, r.stderr).toBe(0)
    const out = JSON.parse(r.stdout)
    expect(out.frame).toBe('heavy')
    const cls = (order: number, key: string) => out.byOrder.find((o: { order: number }) => o.order === order).classes.find((c: { key: string }) => c.key === key)
    expect([1, 2, 3].map((n) => cls(n, `psi* psi (1/m^${n})`).count)).toEqual([2, 2, 7])
    expect(cls(2, 'chi* chi (1/m^2)')).toMatchObject({ count: 2, realParameters: 0 })
    expect(cls(2, 'psi* psi chi* chi (1/m^2)').count).toBe(2)
    expect(cls(1, 'psi* psi (1/m^1)').operators).toBeUndefined()
  })

  it('a heavy-frame theory refuses --max-dim and orders beyond 1/m⁴, with the reason', () => {
    const dim = run('heavy-vexonium', '--max-dim', '6')
    expect([dim.status, dim.stdout]).toEqual([2, ''])
    expect(dim.stderr).toContain('a heavy-frame theory is counted in orders of 1/m: use --max-order N (1 to 4)')
    const deep = run('heavy-vexonium', '--max-order', '5')
    expect(deep.status).toBe(2)
    expect(deep.stderr).toContain('--max-order for a heavy-frame theory is a power of 1/m from 1 to 4, got 5')
  })
})

describe('basis CLI on a heavy-frame theory', () => {
  const basis = (...args: string[]) => spawnSync(process.execPath, ['--import', 'tsx', 'scripts/basis.ts', ...args], { cwd: root, encoding: 'utf8', timeout: 60_000 })
  it('lists each operator with its text, LaTeX and real parameters, order by order (Caswell, Lepage, Phys. Lett. B 167 (1986) 437: D² and σ·B at 1/m)', () => {
    const r = basis(join(root, 'shared/presets/heavy-vexonium.json'), '--max-order', '1')
    expect(r.status, r.stderr).toBe(0)
    const out = JSON.parse(r.stdout)
    const order1 = out.byOrder.find((o: { order: number }) => o.order === 1)
    const psi = order1.classes.find((c: { key: string }) => c.key === 'psi* psi (1/m^1)')
    expect(psi.operators.map((o: { text: string }) => o.text)).toEqual(['ψ^† σ^i B^i ψ', 'ψ^† D^i D^i ψ'])
    expect(psi.operators.every((o: { latex: string; realParameters: number }) => o.latex.startsWith('\\psi^\\dagger') && o.realParameters === 1)).toBe(true)
    const chi = order1.classes.find((c: { key: string }) => c.key === 'chi* chi (1/m^1)')
    expect(chi.operators.map((o: { realParameters: number; fixedBy: { factor: number } }) => [o.realParameters, o.fixedBy.factor])).toEqual([
      [0, -1],
      [0, -1],
    ])
  })
})
