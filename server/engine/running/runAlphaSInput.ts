/**
 * Validation of runAlphaS input: ranges, thresholds, and the flavour bookkeeping
 * (which thresholds are crossed, in which order, and n_f at the start).
 */
import { EngineInputError } from '../errors'
import type { DecouplingLoops } from './qcdDecoupling'
import type { QcdThreshold, RunAlphaSInput } from './runAlphaS'

export interface ValidatedRun { nfFrom: number, down: boolean, crossed: QcdThreshold[], decouplingLoops: DecouplingLoops }

const fail = (msg: string): never => { throw new EngineInputError('runAlphaS', msg) }

function positive(name: string, x: unknown): void {
  if (typeof x !== 'number' || !Number.isFinite(x) || x <= 0) fail(`${name} must be a positive finite number, got ${x}`)
}

function checkThresholds(ths: QcdThreshold[], light: number): void {
  if (ths.length + light > 6) fail(`${light} light flavours plus ${ths.length} thresholds exceed 6 quark flavours`)
  const names = new Set<string>()
  for (const t of ths) {
    positive(`threshold "${t.name}" mass`, t.mass)
    if (t.kind !== 'msbar' && t.kind !== 'pole') fail(`threshold "${t.name}" kind must be "msbar" or "pole", got "${t.kind}"`)
    if (names.has(t.name)) fail(`duplicate threshold name "${t.name}"`)
    names.add(t.name)
  }
}

function startFlavours(input: RunAlphaSInput, ths: QcdThreshold[], light: number): number {
  const nfStrict = light + ths.filter(t => t.mass < input.muFrom).length
  const onThreshold = ths.some(t => t.mass === input.muFrom)
  if (input.nfFrom === undefined) return nfStrict
  if (input.nfFrom === nfStrict || (onThreshold && input.nfFrom === nfStrict + 1)) return input.nfFrom
  return fail(`nfFrom = ${input.nfFrom} does not match μ = ${input.muFrom} GeV and the thresholds (expected ${nfStrict})`)
}

/** Check the input and work out the crossed thresholds in running order. */
export function validateRunAlphaS(input: RunAlphaSInput): ValidatedRun {
  positive('alphaS', input.alphaS)
  if (input.alphaS >= 4 * Math.PI) fail(`alphaS = ${input.alphaS} is not perturbative`)
  positive('muFrom', input.muFrom)
  positive('muTo', input.muTo)
  if (![1, 2, 3, 4].includes(input.loops)) fail(`loops must be 1, 2, 3 or 4, got ${input.loops}`)
  const decouplingLoops = input.decouplingLoops ?? (input.loops >= 3 ? 2 : 1)
  if (decouplingLoops !== 1 && decouplingLoops !== 2) fail(`decouplingLoops must be 1 or 2, got ${input.decouplingLoops}`)
  if ((input.thresholds ?? []).length === 0 && input.lightFlavours === undefined) {
    fail('no thresholds listed: give lightFlavours, the fixed number of active flavours')
  }
  const light = input.lightFlavours ?? 3
  if (!Number.isInteger(light) || light < 0 || light > 6) fail(`lightFlavours must be an integer 0..6, got ${light}`)
  const ths = [...(input.thresholds ?? [])]
  checkThresholds(ths, light)
  const sorted = ths.sort((a, b) => a.mass - b.mass)
  for (let i = 0; i + 1 < sorted.length; i++) {
    if (sorted[i]!.mass === sorted[i + 1]!.mass) fail(`thresholds "${sorted[i]!.name}" and "${sorted[i + 1]!.name}" have the same mass`)
  }
  const nfFrom = startFlavours(input, sorted, light)
  const activeAtStart = (t: QcdThreshold) => sorted.indexOf(t) < nfFrom - light
  const activeAtEnd = (t: QcdThreshold) => t.mass < input.muTo
  const crossed = sorted.filter(t => activeAtStart(t) !== activeAtEnd(t))
  const down = input.muTo < input.muFrom || (input.muTo === input.muFrom && crossed.length > 0 && activeAtStart(crossed[0]!))
  return { nfFrom, down, crossed: down ? crossed.reverse() : crossed, decouplingLoops: decouplingLoops as DecouplingLoops }
}
