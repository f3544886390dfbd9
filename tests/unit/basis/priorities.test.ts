import { describe, expect, it } from 'vitest'
import { execFileSync } from 'node:child_process'
import { classBasis, rewriteOperator } from '../../../server/engine/basis/index'
import smeftJson from './fixtures/smeft.json'
import type { Theory } from '../../../shared/schemas/theory'
import { rat } from '../../../server/engine/exact/rational'
import { describeOperators } from '../../../server/engine/basis/describe'
import katex from 'katex'

const smeft = smeftJson as Theory
const KEY = 'D^2 H^2 H*^2' // two operators, Q_H□ and Q_HD (Grzadkowski et al., JHEP 10 (2010) 085)

describe('choosing the basis under user priorities', () => {
  it('default: fewer-derivative-placement order, two Hermitian operators', () => {
    const b = classBasis(smeft, KEY)
    expect(b.rank).toBe(2)
    expect(b.kept.every((k) => k.source === 'hermitian')).toBe(true)
  })
  it('derivatives placed on H* when asked (as far as possible: only one operator has both on H*, since s34 = s12 on shell)', () => {
    const b = classBasis(smeft, KEY, { priorities: { derivativesOn: ['H*'] } })
    expect(b.rank).toBe(2)
    expect(b.kept[0]!.terms[0]!.lorentz.derivs).toEqual([0, 0, 1, 1])
    const d = classBasis(smeft, KEY)
    expect(d.kept[0]!.terms[0]!.lorentz.derivs).toEqual([1, 1, 0, 0])
  })
  it('operators the user keeps come first, and others rewrite onto them exactly', () => {
    const keep = ['<14>[14]{g:1}', '<12>[12]{g:0} + <34>[34]{g:0}']
    const b = classBasis(smeft, KEY, { priorities: { keep: { [KEY]: keep } } })
    expect(b.kept.map((k) => k.text)).toEqual(keep)
    expect(b.kept.map((k) => k.source)).toEqual(['kept', 'kept'])
    const ops = describeOperators(b)
    expect(ops[1]!.latex).toContain(' +')
    for (const o of ops) expect(() => katex.renderToString(o.latex, { throwOnError: true })).not.toThrow()
    expect(describeOperators(classBasis(smeft, KEY, { priorities: { keep: { [KEY]: ['-1/2 <14>[14]{g:1}'] } } }))[0]!.latex).toMatch(/^-\\tfrac\{1\}\{2\}/)
    const r = rewriteOperator(b, '<14>[14]{g:1}')
    expect(r.coefficients.map((c) => c.coefficient)).toEqual([rat(1), rat(0)])
    // A dependent kept operator is skipped by the greedy choice.
    const b2 = classBasis(smeft, KEY, { priorities: { keep: { [KEY]: ['<14>[14]{g:1}', '2 <14>[14]{g:1}'] } } })
    expect(b2.kept.map((k) => k.text)[0]).toBe('<14>[14]{g:1}')
    expect(b2.kept[1]!.source).not.toBe('kept')
  })
  it('a kept operator text in the wrong class is rejected', () => {
    expect(() => classBasis(smeft, KEY, { priorities: { keep: { [KEY]: ['<12>'] } } })).toThrow(expect.objectContaining({ where: 'parseOperatorText' }))
  })
})

describe('command line scripts/basis.ts', () => {
  it('prints only JSON with the documented keys (real scalar, dimension 6: φ^6, common practice)', () => {
    const theory = JSON.stringify({ name: 'phi', frame: 'relativistic', groups: [], fields: [{ name: 'phi', lorentz: 'scalar', real: true }] })
    const file = '/tmp/scalewright-basis-cli-test.json'
    execFileSync('node', ['-e', `require('fs').writeFileSync(${JSON.stringify(file)}, ${JSON.stringify(theory)})`])
    const out = execFileSync('node', ['--import', 'tsx', 'scripts/basis.ts', file, '--max-dim', '6'], { encoding: 'utf8' })
    const j = JSON.parse(out)
    expect(j.theory).toBe('phi')
    const d6 = j.byDimension.find((d: { dimension: number }) => d.dimension === 6)
    expect(d6.operators).toBe(1)
    expect(d6.tallyOk).toBe(true)
    expect(d6.classes[0].key).toBe('phi^6')
    expect(d6.classes[0].rank).toBe(1)
    expect(d6.classes[0].hilbert).toBe(1)
    expect(Object.keys(d6.classes[0].operators[0])).toEqual(expect.arrayContaining(['latex', 'hermitian', 'flavorComponents']))
  })
  it('fails with a message for a bad --max-dim', () => {
    expect(() => execFileSync('node', ['--import', 'tsx', 'scripts/basis.ts', 'x.json'], { encoding: 'utf8', stdio: 'pipe' })).toThrow('missing --max-dim')
  })
})
