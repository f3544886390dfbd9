import { spawnSync } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'

const root = join(__dirname, '../../..')
const run = (script: 'count' | 'basis', ...args: string[]) => spawnSync(process.execPath, ['--import', 'tsx', `scripts/${script}.ts`, ...args], { cwd: root, encoding: 'utf8', timeout: 120_000 })

function theoryFile(N: number | 'general'): string {
  const file = join(mkdtempSync(join(tmpdir(), 'goldstone-cli-')), 'pions.json')
  writeFileSync(
    file,
    JSON.stringify({ name: 'three light pions', frame: 'goldstone', groups: [], fields: [], goldstone: { coset: 'chiral', N, sources: { scalar: true, vector: true }, maxOrder: 4 } }),
  )
  return file
}

describe('count and basis CLI on a Goldstone-frame theory', () => {
  it('count --max-order 8, N = 3: 2, 12, 117, 1959 per chiral order (Graf, Henning, Lu, Melia, Murayama, JHEP 01 (2021) 142), p⁴ with H1, H2 as contact terms (Gasser & Leutwyler, Nucl. Phys. B 250 (1985) 465)', () => {
    const r = run('count', theoryFile(3), '--max-order', '8')
    expect(r.status).toBe(0)
    const out = JSON.parse(r.stdout)
    expect(out.theory).toBe('three light pions')
    expect(out.byOrder.map((o: { order: number; operators: number }) => [o.order, o.operators])).toEqual([
      [2, 2],
      [4, 12],
      [6, 117],
      [8, 1959],
    ])
    expect(out.byOrder[1]).toMatchObject({ byParity: { even: 12, odd: 0 }, contact: 2 })
    expect(out.byOrder[2].byParity.odd).toBe(23)
    expect(out.byOrder[1].classes.length).toBeGreaterThan(0)
  })

  it('basis --max-order 4, N = 2: l1 … l7 and h1, h2, h3 as ten kept operators, tally-checked (Gasser & Leutwyler, Ann. Phys. 158 (1984) 142)', () => {
    const r = run('basis', theoryFile(2), '--max-order', '4')
    expect(r.status).toBe(0)
    const p4 = JSON.parse(r.stdout).byOrder.find((o: { order: number }) => o.order === 4)
    expect(p4).toMatchObject({ operators: 10, hilbert: 10, tallyOk: true })
    const kept = p4.classes.flatMap((c: { operators: { text: string }[] }) => c.operators)
    expect(kept).toHaveLength(10)
    expect(p4.classes.find((c: { key: string }) => c.key === 'contact').operators).toHaveLength(3)
  }, 120_000)

  it('a bad order: message on stderr, exit code 2, nothing on stdout', () => {
    const r = run('count', theoryFile(3), '--max-order', '16')
    expect([r.status, r.stdout]).toEqual([2, ''])
    expect(r.stderr).toContain('the highest chiral order must be an even power of p from 2 to 14, got 16')
  })
})
