/**
 * Plain-language hints: which kinds of operators a heavy field can generate when it is
 * integrated out, at tree level and at one loop. Descriptions only — the explicit matching
 * lives in server/engine/matching/.
 */
import type { TheoryField, TheoryGroup } from '../../../shared/schemas/theory'
import { isChargedUnder } from './thresholdShifts'

export interface GeneratedClassHint {
  field: string
  loop: 'tree' | 'one-loop'
  description: string
}

function gaugeHints(f: TheoryField, groups: readonly TheoryGroup[]): GeneratedClassHint[] {
  const out: GeneratedClassHint[] = []
  for (const g of groups) {
    if (!g.gauge || !isChargedUnder(f, g)) continue
    const abelian = g.type === 'U1'
    const strength = abelian ? `${g.name} field strength (abelian)` : `${g.name} field strength`
    out.push({ field: f.name, loop: 'one-loop', description: `shift of the ${strength} kinetic term (threshold correction to the ${g.name} coupling)` })
    out.push({
      field: f.name,
      loop: 'one-loop',
      description: !abelian
        ? `pure-gauge operators of ${g.name}: X^3 at dimension 6, X^4 at dimension 8, and X D^2 X (reducible by the equations of motion to currents)`
        : `pure-gauge operators of ${g.name}: F D^2 F at dimension 6 (vacuum polarization, Uehling) and F^4 at dimension 8 (Euler–Heisenberg type)`,
    })
  }
  return out
}

/**
 * Hints of the operator classes a removed field can generate.
 * Conventions: "tree" needs a coupling linear in the heavy field (to be checked on the
 * Lagrangian); "one-loop" arises from any gauge charge.
 * @example generatedClassHints({ name: 'S', lorentz: 'scalar', real: true }, [])[0].loop // 'tree'
 * Method: rules of thumb of tree-level and one-loop matching.
 * Reference: J. de Blas, J. C. Criado, M. Pérez-Victoria, J. Santiago, JHEP 03 (2018) 109 (tree level);
 *   B. Henning, X. Lu, H. Murayama, JHEP 01 (2016) 023 (one loop).
 */
export function generatedClassHints(f: TheoryField, groups: readonly TheoryGroup[]): GeneratedClassHint[] {
  const tree: GeneratedClassHint[] =
    f.lorentz === 'scalar'
      ? [
          {
            field: f.name,
            loop: 'tree',
            description: `if ${f.name} couples linearly to light fields (a Yukawa coupling to a light fermion bilinear or a trilinear with light scalars): four-fermion operators, scalar-fermion operators and scalar-potential operators from its propagator (dimension 6 and up)`,
          },
        ]
      : [
          {
            field: f.name,
            loop: 'tree',
            description: `if ${f.name} mixes with light fermions through a Yukawa coupling (vector-like fermion): operators with two fermions, scalars and derivatives (e.g. ψ^2 H^2 D, ψ^2 H^3 type) at dimension 6`,
          },
        ]
  const loop: GeneratedClassHint[] = [
    {
      field: f.name,
      loop: 'one-loop',
      description: `scalar and fermion operators from loops of ${f.name} with its couplings to light fields (dipoles if it couples to light fermions and a gauge field)`,
    },
  ]
  return [...tree, ...gaugeHints(f, groups), ...loop]
}
