/**
 * Validation of runAlphaS input: ranges, thresholds, and the flavour bookkeeping
 * (which thresholds are crossed, in which order, and n_f at the start).
 */
import { EngineInputError } from '../errors'
import type { DecouplingLoops, HeavyMassKind } from './qcdDecoupling'
import type { CancelSignal } from './odeStepper'

export interface QcdThreshold {
  name: string
  mass: number
  kind: HeavyMassKind
}
export interface RunAlphaSInput {
  alphaS: number
  muFrom: number
  muTo: number
  loops: 1 | 2 | 3 | 4
  thresholds?: QcdThreshold[]
  /** Powers of α_s/π kept in the decoupling relation: 1 or 2 (default: 2 when loops ≥ 3, else 1). */
  decouplingLoops?: DecouplingLoops
  /** Quarks lighter than every threshold (default 3: u, d, s; required when no thresholds are listed). */
  lightFlavours?: number
  /** Flavours at muFrom; only needed when muFrom sits exactly on a threshold mass. */
  nfFrom?: number
  onProgress?: (fraction: number, label: string) => void
  signal?: CancelSignal
}

export interface ValidatedRun {
  nfFrom: number
  down: boolean
  crossed: QcdThreshold[]
  decouplingLoops: DecouplingLoops
}

const fail = (msg: string): never => {
  throw new EngineInputError('runAlphaS', msg)
}

function positive(name: string, x: unknown): void {
  if (typeof x !== 'number' || !Number.isFinite(x) || x <= 0) fail(`${name} must be a positive number, but it is ${x}`)
}

function checkThresholds(ths: QcdThreshold[], light: number): void {
  if (ths.length + light > 6) fail(`${light} light flavours plus ${ths.length} heavy quarks make more than 6 quark flavours; remove heavy quarks or lower the light flavours`)
  const names = new Set<string>()
  for (const t of ths) {
    positive(`The mass of heavy quark "${t.name}"`, t.mass)
    if (t.kind !== 'msbar' && t.kind !== 'pole') fail(`The mass of heavy quark "${t.name}" must be an MS-bar mass ("msbar") or a pole mass ("pole"), not "${t.kind}"`)
    if (names.has(t.name)) fail(`Two heavy quarks are named "${t.name}"; give each its own name`)
    names.add(t.name)
  }
}

function startFlavours(input: RunAlphaSInput, ths: QcdThreshold[], light: number): number {
  const nfStrict = light + ths.filter((t) => t.mass < input.muFrom).length
  const onThreshold = ths.some((t) => t.mass === input.muFrom)
  if (input.nfFrom === undefined) return nfStrict
  if (input.nfFrom === nfStrict || (onThreshold && input.nfFrom === nfStrict + 1)) return input.nfFrom
  return fail(`${input.nfFrom} active flavours at μ₀ = ${input.muFrom} GeV do not match the heavy quarks listed (they give ${nfStrict}); correct the number of flavours or the quark masses`)
}

/** Check the input and work out the crossed thresholds in running order. */
export function validateRunAlphaS(input: RunAlphaSInput): ValidatedRun {
  positive('α_s', input.alphaS)
  if (input.alphaS >= 4 * Math.PI) fail(`α_s = ${input.alphaS} is not perturbative (it must stay below 4π); choose a smaller α_s`)
  positive('The starting scale μ₀ (GeV)', input.muFrom)
  positive('The wanted scale μ (GeV)', input.muTo)
  if (![1, 2, 3, 4].includes(input.loops)) fail(`The loops in β must be 1, 2, 3 or 4, not ${input.loops}`)
  const decouplingLoops = input.decouplingLoops ?? (input.loops >= 3 ? 2 : 1)
  if (decouplingLoops !== 1 && decouplingLoops !== 2) fail(`The decoupling loops must be 1 or 2, not ${input.decouplingLoops}`)
  if ((input.thresholds ?? []).length === 0 && input.lightFlavours === undefined) {
    fail('No heavy quarks are listed: give the number of light flavours, which then stays fixed, or list the heavy quarks')
  }
  const light = input.lightFlavours ?? 3
  if (!Number.isInteger(light) || light < 0 || light > 6) fail(`The light flavours must be a whole number from 0 to 6, not ${light}`)
  const ths = [...(input.thresholds ?? [])]
  checkThresholds(ths, light)
  const sorted = ths.sort((a, b) => a.mass - b.mass)
  for (let i = 0; i + 1 < sorted.length; i++) {
    if (sorted[i]!.mass === sorted[i + 1]!.mass) fail(`Heavy quarks "${sorted[i]!.name}" and "${sorted[i + 1]!.name}" have the same mass; give them different masses`)
  }
  const nfFrom = startFlavours(input, sorted, light)
  const activeAtStart = (t: QcdThreshold) => sorted.indexOf(t) < nfFrom - light
  const activeAtEnd = (t: QcdThreshold) => t.mass < input.muTo
  const crossed = sorted.filter((t) => activeAtStart(t) !== activeAtEnd(t))
  const down = input.muTo < input.muFrom || (input.muTo === input.muFrom && crossed.length > 0 && activeAtStart(crossed[0]!))
  return { nfFrom, down, crossed: down ? crossed.reverse() : crossed, decouplingLoops: decouplingLoops as DecouplingLoops }
}
