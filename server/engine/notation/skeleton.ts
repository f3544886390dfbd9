/**
 * The index skeleton of one printed term: every object (field, derivative, matrix, tensor)
 * with its index slots, implicit indices joined along chains (ψ̄ Γ χ, H† τ^I H: a row, the
 * matrices, a column, for the Dirac index and for each SU(N) separately), explicit indices
 * typed by their letter, and each index checked to appear exactly twice.
 *
 * Letters: μ ν ρ σ λ κ … Lorentz; capitals A, B, I, J … adjoint; i j k l m n the SU(2)
 * fundamental; α β γ δ a b c the SU(3) fundamental (a field with one non-trivial group takes
 * any of them); p r s t flavour (read and ignored: one flavour). Reference: common practice.
 */
import { EngineInputError } from '../errors'
import type { TheoryModel } from '../theory/model'
import type { FieldItem, Index, Item, MatrixItem, Term, TensorItem } from './ast'

export type SlotType = 'vec' | 'dirac' | `adj:${string}` | `fund:${string}`

export interface Slot {
  label: string
  type: SlotType
  pos: number
}

export interface FieldObject {
  kind: 'field'
  item: FieldItem
  dirac: Slot | null
  vecs: Slot[]
  derivs: Slot[]
  gauge: Record<string, Slot>
}
export interface MatrixObject {
  kind: 'matrix'
  item: MatrixItem
  group: string | null
  slots: Slot[]
}
export interface TensorObject {
  kind: 'tensor'
  item: TensorItem
  group: string | null
  slots: Slot[]
}
export type SkeletonObject = FieldObject | MatrixObject | TensorObject

export interface Skeleton {
  objects: SkeletonObject[]
  fields: FieldObject[]
  pairs: { type: SlotType; a: Slot; b: Slot }[]
}

const VECTOR = new Set(['mu', 'nu', 'rho', 'sigma', 'lambda', 'kappa', 'eta', 'xi', 'omega', 'zeta', 'theta'])
const SU3 = new Set(['alpha', 'beta', 'gamma', 'delta', 'a', 'b', 'c'])
const SU2 = new Set(['i', 'j', 'k', 'l', 'm', 'n'])
const FLAVOUR = new Set(['p', 'r', 's', 't', 'w'])

class Builder {
  private n = 0
  readonly objects: SkeletonObject[] = []
  constructor(
    readonly model: TheoryModel,
    readonly text: string,
  ) {}

  fail(pos: number, why: string): never {
    throw new EngineInputError('readOperator', `At position ${pos + 1} of "${this.text}": ${why}`)
  }
  fresh(): string {
    return `~${this.n++}`
  }
  groupOfN(n: number, pos: number, what: string): string {
    const gs = this.model.su.filter((g) => g.n === n)
    if (gs.length !== 1) this.fail(pos, `${what} needs exactly one SU(${n}) group in the theory, which has ${gs.length}`)
    return gs[0]!.name
  }
  slot(ix: Index | null, type: SlotType, pos: number): Slot {
    return { label: ix ? ix.name : this.fresh(), type, pos: ix?.pos ?? pos }
  }

  field(it: FieldItem): FieldObject {
    const f = this.model.species.find((s) => s.field === it.name)!
    const charged = this.model.su.filter((g) => f.suKind[g.name] !== 'singlet')
    const obj: FieldObject = { kind: 'field', item: it, dirac: f.fermion ? { label: `?d${this.n++}`, type: 'dirac', pos: it.pos } : null, vecs: [], derivs: [], gauge: {} }
    const strength = f.lorentz === 'FL' || f.lorentz === 'FR'
    for (const ix of it.indices) {
      if (FLAVOUR.has(ix.name)) continue
      if (VECTOR.has(ix.name)) {
        if (!strength) this.fail(ix.pos, `${it.name} has no Lorentz index ${ix.name}; only field strengths and derivatives carry one`)
        obj.vecs.push(this.slot(ix, 'vec', it.pos))
        continue
      }
      const g = this.indexGroup(
        ix,
        charged.map((c) => c.name),
        it,
      )
      const kind = f.suKind[g]
      obj.gauge[g] = this.slot(ix, kind === 'adj' ? `adj:${g}` : `fund:${g}`, it.pos)
    }
    if (strength && obj.vecs.length !== 2) this.fail(it.pos, `the field strength ${it.name} needs two Lorentz indices, e.g. ${it.name}_{\\mu\\nu}`)
    for (const g of charged) {
      if (obj.gauge[g.name]) continue
      if (f.suKind[g.name] === 'adj') this.fail(it.pos, `write the ${g.name} adjoint index of ${it.name} (a capital letter, e.g. ${it.name}^A_{\\mu\\nu})`)
      obj.gauge[g.name] = { ...this.slot(null, `fund:${g.name}`, it.pos), label: `?${this.n++}` }
    }
    obj.derivs = it.derivs.map((d) => this.slot(d, 'vec', d.pos))
    return obj
  }

  indexGroup(ix: Index, charged: string[], it: FieldItem): string {
    const upper = /^[A-Z]$/.test(ix.name)
    const candidates = charged.filter((g) => upper === (this.model.species.find((s) => s.field === it.name)!.suKind[g] === 'adj'))
    if (candidates.length === 1) return candidates[0]!
    const byLetter = SU2.has(ix.name) ? 2 : SU3.has(ix.name) ? 3 : 0
    const g = this.model.su.find((x) => x.n === byLetter && candidates.includes(x.name))
    if (!g) this.fail(ix.pos, `the index ${ix.name} on ${it.name} does not name one of its groups; use i, j, k for SU(2), α, β or a, b for SU(3), capitals for the adjoint, Greek μ, ν for Lorentz`)
    return g.name
  }

  matrix(it: MatrixItem): MatrixObject {
    const vec = it.indices.map((ix) => this.slot(ix, 'vec', it.pos))
    if (it.which === 'gen') {
      const n = it.symbol === 'tau' ? 2 : 3
      const g = this.groupOfN(n, it.pos, `The generator at this position`)
      return { kind: 'matrix', item: it, group: g, slots: [this.slot(it.indices[0]!, `adj:${g}`, it.pos)] }
    }
    return { kind: 'matrix', item: it, group: null, slots: vec }
  }

  tensor(it: TensorItem): TensorObject {
    if (it.which === 'f' || it.which === 'd') return { kind: 'tensor', item: it, group: null, slots: it.indices.map((ix) => this.slot(ix, 'adj:?', it.pos)) }
    return { kind: 'tensor', item: it, group: null, slots: it.indices.map((ix) => this.slot(ix, 'fund:?', it.pos)) }
  }
}

/** Join implicit slots and matrices along chains, per flow (Dirac and each SU(N)). */
function chain(b: Builder, items: Item[], objs: Map<Item, SkeletonObject>, flows: string[], trace: boolean): void {
  for (const flow of flows) {
    let open: string | null = null
    let start: string | null = null
    const visit = (list: Item[]): void => {
      for (const it of list) {
        if (it.kind === 'group') {
          if (it.trace) chain(b, it.items, objs, flows, true)
          else visit(it.items)
          continue
        }
        const o = objs.get(it)!
        if (o.kind === 'field') {
          const s = flow === 'dirac' ? o.dirac : (o.gauge[flow.slice(5)] ?? null)
          if (!s || !s.label.startsWith('?')) continue
          if (open === null) {
            s.label = b.fresh()
            open = s.label
          } else {
            s.label = open
            open = null
          }
        } else if (o.kind === 'matrix' && matrixFlow(o) === flow) {
          if (open === null) {
            if (!trace) b.fail(o.item.pos, 'this matrix has nothing to act on at its left; write the barred field (or H^\\dagger) first')
            open = b.fresh()
            start = open
          }
          const right = b.fresh()
          o.slots.push(
            { label: open, type: flow === 'dirac' ? 'dirac' : `fund:${flow.slice(5)}`, pos: o.item.pos },
            { label: right, type: flow === 'dirac' ? 'dirac' : `fund:${flow.slice(5)}`, pos: o.item.pos },
          )
          open = right
        }
      }
    }
    visit(items)
    if (open !== null && trace && start !== null) renameLabel([...objs.values()], open, start)
    else if (open !== null) {
      const where = [...objs.values()].find((o) => o.kind === 'field' && (o.dirac?.label === open || Object.values(o.gauge).some((s) => s.label === open)))
      b.fail(
        where?.kind === 'field' ? where.item.pos : 0,
        flow === 'dirac'
          ? 'a fermion has no partner in its bilinear; write (\\bar\\psi … \\chi) with one barred and one unbarred fermion'
          : `an implicit ${flow.slice(5)} index has no partner; write the index explicitly (e.g. H^j \\varepsilon_{jk} H^k)`,
      )
    }
  }
}

function matrixFlow(o: MatrixObject): string {
  return o.item.which === 'gen' ? `fund:${o.group}` : 'dirac'
}

function renameLabel(objs: SkeletonObject[], from: string, to: string): void {
  for (const o of objs) {
    const slots = o.kind === 'field' ? [o.dirac, ...o.vecs, ...o.derivs, ...Object.values(o.gauge)] : o.slots
    for (const s of slots) if (s && s.label === from) s.label = to
  }
}

function allSlots(o: SkeletonObject): Slot[] {
  return o.kind === 'field' ? [...(o.dirac ? [o.dirac] : []), ...o.vecs, ...o.derivs, ...Object.values(o.gauge)] : o.slots
}

/**
 * Build the skeleton of a term: objects with slots, and the list of contracted pairs.
 * Throws EngineInputError for an index seen once or more than twice, or of two kinds.
 */
export function buildSkeleton(model: TheoryModel, text: string, term: Term): Skeleton {
  const b = new Builder(model, text)
  const objs = new Map<Item, SkeletonObject>()
  const walk = (list: Item[]): void => {
    for (const it of list) {
      if (it.kind === 'group') {
        walk(it.items)
        continue
      }
      if (it.kind === 'matrix' && it.which === 'gen' && it.indices.length !== 1) b.fail(it.pos, 'a generator needs one adjoint index')
      const o = it.kind === 'field' ? b.field(it) : it.kind === 'matrix' ? b.matrix(it) : b.tensor(it)
      objs.set(it, o)
    }
  }
  walk(term.items)
  chain(b, term.items, objs, ['dirac', ...model.su.map((g) => `fund:${g.name}`)], false)
  const objects = [...objs.values()]
  const byLabel = new Map<string, Slot[]>()
  for (const o of objects) for (const s of allSlots(o)) byLabel.set(s.label, [...(byLabel.get(s.label) ?? []), s])
  const pairs: Skeleton['pairs'] = []
  for (const [label, slots] of byLabel) {
    const name = label.startsWith('~') ? 'an implicit index' : `the index ${label}`
    if (slots.length !== 2) b.fail(slots[slots.length - 1]!.pos, `${name} appears ${slots.length === 1 ? 'once' : `${slots.length} times`}; every index must appear exactly twice`)
    pairs.push({ type: unify(b, slots[0]!, slots[1]!), a: slots[0]!, b: slots[1]! })
  }
  for (const o of objects) if (o.kind === 'tensor') o.group = tensorGroup(b, o)
  return { objects, fields: objects.filter((o): o is FieldObject => o.kind === 'field'), pairs }
}

/** The common type of two contracted slots (ε, δ, f, d take theirs from the partner). */
function unify(b: Builder, x: Slot, y: Slot): SlotType {
  const open = (t: SlotType): boolean => t.endsWith(':?')
  if (open(x.type) && !open(y.type)) {
    x.type = y.type
    return y.type
  }
  if (open(y.type) && !open(x.type)) {
    y.type = x.type
    return x.type
  }
  if (x.type !== y.type) b.fail(y.pos, `the index ${x.label} joins a ${describe(x.type)} and a ${describe(y.type)} index`)
  if (open(x.type)) b.fail(y.pos, `the index ${x.label} only joins two ε/δ/f tensors; contract it with a field`)
  return x.type
}

function describe(t: SlotType): string {
  return t === 'vec' ? 'Lorentz' : t === 'dirac' ? 'Dirac' : t.startsWith('adj') ? `${t.slice(4)} adjoint` : `${t.slice(5)} fundamental`
}

function tensorGroup(b: Builder, o: TensorObject): string {
  const groups = new Set(o.slots.map((s) => s.type.split(':')[1]!))
  if (groups.size !== 1 || groups.has('?')) b.fail(o.item.pos, `the indices of ${o.item.which} must all belong to one group`)
  return [...groups][0]!
}
