// Known bad inputs of the engine, one or more per place that throws an input error
// (engineMessages.test.ts checks that every such place is reached and that every message
// passes the forbidden list). `says` pins the part of the message a user acts on.
import { repDimension } from '../../../server/engine/group/representation'
import { rootSystemOf } from '../../../server/engine/group/lie/simpleGroups'
import { lieDimension, lieWeights } from '../../../server/engine/group/lie/lieWeights'
import { liePlethysm, lieSingletCount } from '../../../server/engine/group/lie/lieIrrep'
import { adamsClass, finiteGroup, irrepIndex } from '../../../server/engine/group/finite/finiteGroup'
import type { FiniteKind } from '../../../shared/physics/finite/tables'
import { cpLorentzSeries } from '../../../server/engine/counting/cpLorentz'
import { mixedTensorShape } from '../../../server/engine/counting/twining'
import type { Theory } from '../../../shared/schemas/theory'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { findPreset } from '../../../shared/presets/index'
import { buildBasis, classBasis, rewriteOperator, parseOperatorText, basisSpecies, parseClassKey as basisClassKey } from '../../../server/engine/basis/index'
import { parityLegMap } from '../../../server/engine/basis/parityPartners'
import { typedFingerprint } from '../../../server/engine/board/typedOperator'
import { expressIn, type Fingerprint } from '../../../server/engine/board/fingerprints'
import { ruleOrders } from '../../../server/engine/board/ruleOrders'
import { countOperators, enumerateClasses, enumerateFieldContents, lorentzSingletSeries } from '../../../server/engine/counting/index'
import { countsOfClassKey } from '../../../server/engine/theory/classKey'
import { cycleTypes } from '../../../server/engine/counting/cycleTypes'
import { buildTheoryModel } from '../../../server/engine/theory/model'
import {
  characterPower,
  characterProduct,
  multiplyIrreps,
  productCharacter,
  productSingletCount,
  schurFunctorCharacter,
  singletCount,
  suDimension,
  suWeights,
  symmetricCharacter,
  plethysm,
  lorentzWeights,
} from '../../../server/engine/group/index'
import { div, parseRational, rat, toBigInt, ONE, ZERO } from '../../../server/engine/exact/rational'
import { solve } from '../../../server/engine/finite/matrix'
import { PrimeField, workingPrimes } from '../../../server/engine/finite/primeField'
import { reconstructRational } from '../../../server/engine/finite/rationalReconstruction'
import { combo, enumerateHeavy, enumerateHeavyTheory, enumerateFourFermion, fourFermionSpace, orderSpace, rewriteHeavy } from '../../../server/engine/heavy/index'
import { enumerateHeavyLight } from '../../../server/engine/heavy/heavyLight'
import { enumerateHeavyHeavy } from '../../../server/engine/heavy/heavyHeavy'
import { vacuumPolarizationOneLoop, vacuumPolarizationSeries } from '../../../server/engine/matching/vacuumPolarization'
import { orderOf, orderOfOperator, resolveRule, blocksFromClassKey } from '../../../server/engine/rules/index'
import { alphaQedAtZ, decouplingCoefficients, decouplingFactor, alphaSAboveThreshold, qcdBeta, runAlphaQED, runAlphaS, leptonicShiftOneLoop } from '../../../server/engine/running/index'
import { gaugeBetaCoefficients, gaugeContentOf, gaugeCouplingsAt, gaugeRunningReport, runGaugeCouplings, simpleGroupFactors, towerGaugeContent } from '../../../server/engine/running/gauge/index'
import { goldstoneCases } from './goldstoneBadInputs'
import { notationCases } from './notationBadInputs'
import { buildScaleLadder, fromMeV, integrateOut, parseDecimal, thresholdShifts, toMeV } from '../../../server/engine/scales/index'
import { orderZero, orderZeroHeavy } from '../../../server/engine/basis/orderZero'
import { resolveCouplings } from '../../../server/engine/basis/orderZeroCouplings'
import { matchHeavyScalar } from '../../../server/engine/matching/treeScalarExchange'

export interface BadInput {
  name: string
  run: () => unknown
  says?: RegExp
}

const preset = (id: string) => findPreset(id)!.theory as Theory
const phi: Theory = { name: 'real scalar', frame: 'relativistic', groups: [], fields: [{ name: 'phi', lorentz: 'scalar', real: true }] }
const qedLike = { heavy: { particle: { name: 'psi', charges: { X: '1' } }, gaugeGroup: 'X', maxOrder: 3 }, groups: [{ name: 'X', type: 'U1' as const, gauge: true }] }
const ladder = {
  scales: [
    { name: 'E', value: '10', unit: 'GeV' as const },
    { name: 'M', value: '1', unit: 'TeV' as const },
  ],
  parameters: [{ name: 'eps', numerator: 'E', denominator: 'M' }],
}
const qcd = { alphaS: 0.118, muFrom: 91.1876, muTo: 10, loops: 2 as const, thresholds: [{ name: 'b', mass: 4.18, kind: 'msbar' as const }] }
const sm = { frame: 'relativistic' as const, species: buildTheoryModel({ name: 'one scalar', frame: 'relativistic', groups: [], fields: [{ name: 'H', lorentz: 'scalar' }] }).species }
const twoPrimes = workingPrimes(2)
const print = (values: (p: number) => number[]): Fingerprint => ({ primes: twoPrimes, values: twoPrimes.map(values) })
const bidoublet: Theory = parseTheory({
  name: 'bidoublet',
  frame: 'relativistic',
  groups: [
    { name: 'A', type: 'SU', n: 2, gauge: false },
    { name: 'B', type: 'SU', n: 2, gauge: false },
  ],
  fields: [{ name: 'P', lorentz: 'scalar', real: true, reps: { A: [1], B: [1] } }],
})

const theoryCases: BadInput[] = [
  { name: 'a theory file that is not JSON', run: () => parseTheory('{ "name": '), says: /^The theory file is not valid JSON/ },
  {
    name: 'a real scalar with a charge',
    run: () => parseTheory({ name: 'x', frame: 'relativistic', groups: [{ name: 'Y', type: 'U1', gauge: true }], fields: [{ name: 'phi', lorentz: 'scalar', real: true, charges: { Y: '1/3' } }] }),
    says: /^Field 1 "phi", charge under Y: a real scalar/,
  },
  {
    name: 'an SU group without n, and labels for it',
    run: () => parseTheory({ name: 'x', frame: 'relativistic', groups: [{ name: 'G', type: 'SU', gauge: true }], fields: [{ name: 'phi', lorentz: 'scalar', reps: { G: [1] } }] }),
    says: /^Symmetry 1 "G", n: SU\(n\) needs n from 2 to 8; give n$/,
  },
  { name: 'an untyped, empty theory', run: () => parseTheory({ name: '', frame: 'x', groups: {}, fields: [{ name: 'a', lorentz: 'Q', reps: { '1bad': [1] } }] }), says: /^Name must not be empty/ },
  { name: 'a count of a heavy-frame theory', run: () => countOperators(preset('heavy-vexonium'), { maxDim: 6 }), says: /Hilbert-series count does not cover/ },
  { name: 'a count below dimension 5', run: () => countOperators(phi, { maxDim: 4 }) },
  { name: 'a count with seven flavors', run: () => countOperators(phi, { maxDim: 6, nf: 7 }), says: /number of flavors/ },
  { name: 'a class naming an unknown field (counting)', run: () => countsOfClassKey(buildTheoryModel(phi), 'D^2 X^2'), says: /not a field of this theory/ },
  { name: 'dimensions in the wrong order', run: () => enumerateFieldContents(buildTheoryModel(phi), 7, 6) },
  { name: 'a dimension of 0', run: () => enumerateClasses(buildTheoryModel(phi), 0) },
  {
    name: 'charges with a huge common denominator',
    run: () =>
      enumerateFieldContents(
        buildTheoryModel(
          parseTheory({
            name: 'odd',
            frame: 'relativistic',
            groups: [{ name: 'Y', type: 'U1', gauge: true }],
            fields: [
              { name: 'a', lorentz: 'scalar', charges: { Y: '1/999999937' } },
              { name: 'b', lorentz: 'scalar', charges: { Y: '1/999999929' } },
              { name: 'c', lorentz: 'scalar', charges: { Y: '1/999999893' } },
            ],
          }),
        ),
        6,
        6,
      ),
    says: /common denominator/,
  },
  { name: 'nineteen copies of one field', run: () => cycleTypes(19), says: /lower the maximum dimension/ },
  { name: 'more than 40 derivatives', run: () => lorentzSingletSeries([], 41) },
]

const basisCases: BadInput[] = [
  { name: 'an explicit basis beyond dimension 12', run: () => buildBasis(phi, { maxDim: 13 }) },
  { name: 'an explicit basis with seven flavors', run: () => buildBasis(phi, { maxDim: 6, nf: 7 }) },
  { name: 'an explicit basis of a heavy-frame theory', run: () => classBasis({ ...phi, frame: 'heavy' }, 'phi^6') },
  { name: 'an explicit basis of a real bidoublet', run: () => classBasis(bidoublet, 'P^4'), says: /equal upper and lower index shapes/ },
  { name: 'a class naming an unknown field (basis)', run: () => classBasis(phi, 'psi^4') },
  { name: 'a class of two fields', run: () => classBasis(phi, 'phi^2') },
  { name: 'a class of thirteen fields', run: () => classBasis(phi, 'phi^13'), says: /at most 12/ },
  { name: 'a typed operator with a bad bracket', run: () => rewriteOperator(classBasis(phi, 'D^2 phi^4'), 's15'), says: /two different legs from 1 to 4/ },
  { name: 'a typed operator with unreadable text', run: () => rewriteOperator(classBasis(phi, 'D^2 phi^4'), 's12 ?') },
  { name: 'a typed operator with too many derivatives', run: () => rewriteOperator(classBasis(phi, 'D^2 phi^4'), 's12 s34') },
  { name: 'a typed operator with the wrong helicities', run: () => rewriteOperator(classBasis(phi, 'D^2 phi^4'), '<12>') },
  { name: 'an empty typed operator', run: () => parseOperatorText(basisClassKey(basisSpecies(phi), 'phi^4'), '', 1) },
  { name: 'a missing gauge contraction', run: () => typedFingerprint(preset('smeft'), 'D^2 H^2 H*^2', '<13>[13]'), says: /needs a gauge contraction/ },
  { name: 'a gauge contraction that does not exist', run: () => parseOperatorText(basisClassKey(basisSpecies(phi), 'phi^4'), '{g:3}', 1) },
  { name: 'a power without a bracket', run: () => parseOperatorText(basisClassKey(basisSpecies(phi), 'phi^4'), '^2', 1) },
  { name: 'a bracket with one leg', run: () => parseOperatorText(basisClassKey(basisSpecies(phi), 'phi^4'), '<1>', 1) },
  { name: 'an empty term', run: () => parseOperatorText(basisClassKey(basisSpecies(phi), 'phi^4'), '1 + + 1', 1) },
  { name: 'mismatched brackets', run: () => parseOperatorText(basisClassKey(basisSpecies(phi), 'phi^4'), '<12]', 1) },
  { name: 'h.c. written the wrong way', run: () => typedFingerprint(preset('smeft'), 'D L L* H^2 H*^2', '<13>[23]{g:2} + h.c.'), says: /"\(X\) \+ h\.c\."/ },
  { name: 'h.c. of a class that is not its own conjugate', run: () => typedFingerprint(preset('smeft'), 'L e* H', '(<12>) + h.c.') },
  { name: 'a parity image of a class that parity moves', run: () => parityLegMap(basisSpecies(preset('qed')), basisClassKey(basisSpecies(preset('qed')), 'eL eR* A_L')) },
  // A constant amplitude is no multiple of s² + t² + u², the one operator of D^4 φ^4.
  {
    name: 'a rewrite coefficient beyond what stored fingerprints determine',
    run: () =>
      expressIn(
        [print(() => [1, 0, 0]), print(() => [0, 1, 0])],
        print((p) => [1, (2 ** 26 + 15) % p, 0]),
      ),
    says: /^The coefficient of kept operator 2 is not a fraction with numerator and denominator up to \d+/,
  },
  {
    name: 'a rewrite outside the span',
    run: () => rewriteOperator(classBasis(phi, 'D^4 phi^4'), { label: 'one', evaluate: (_F, _pt, map) => (map.every((m, i) => m === i) ? 1 : 0) }),
    says: /is not a combination of the operators of the class D\^4 phi\^4/,
  },
]

const heavyCases: BadInput[] = [
  { name: 'a heavy particle coupled to a discrete group', run: () => enumerateHeavy({ ...qedLike, groups: [{ name: 'X', type: 'Z', n: 2 }] }) },
  { name: 'a heavy particle coupled to an unknown group', run: () => enumerateHeavy({ ...qedLike, groups: [{ name: 'Y', type: 'U1' }] }) },
  { name: 'a heavy octet', run: () => enumerateHeavy({ heavy: { particle: { name: 'psi', reps: { C: [1, 1] } }, gaugeGroup: 'C', maxOrder: 3 }, groups: [{ name: 'C', type: 'SU', n: 3 }] }) },
  {
    name: 'a heavy particle charged under two SU(N)',
    run: () =>
      enumerateHeavy({
        heavy: { particle: { name: 'psi', reps: { C: [1, 0], W: [1] } }, gaugeGroup: 'C', maxOrder: 2 },
        groups: [
          { name: 'C', type: 'SU', n: 3 },
          { name: 'W', type: 'SU', n: 2 },
        ],
      }),
    says: /two non-abelian groups \(C, W\)/,
  },
  {
    name: 'an adjoint light scalar beside a heavy quark',
    run: () =>
      enumerateHeavyLight({
        particle: 'Q',
        heavy: { reps: { C: [1, 0] }, charges: {} },
        fields: [{ name: 'S8', lorentz: 'scalar', real: true, reps: { C: [1, 1] } }],
        groups: [{ name: 'C', type: 'SU', n: 3, gauge: true }],
        maxOrder: 2,
        parity: true,
        timeReversal: true,
      }),
    says: /^Light field S8 sits in \[1,1\] of C/,
  },
  { name: 'heavy–heavy operators at order 3', run: () => enumerateHeavyHeavy(3, 1, 'psi', true) },
  { name: 'heavy operators of a relativistic theory', run: () => enumerateHeavyTheory({ frame: 'relativistic', groups: [] }) },
  { name: 'a heavy frame without its particle', run: () => enumerateHeavyTheory({ frame: 'heavy', groups: [] }) },
  { name: 'four-fermion operators at order 3', run: () => enumerateFourFermion(3, 1, 'psi', 'chi') },
  { name: 'a four-fermion space at order 6', run: () => fourFermionSpace(6) },
  { name: 'an order 5 in 1/m', run: () => orderSpace(5, true) },
  { name: 'a heavy rewrite outside the span', run: () => rewriteHeavy(combo([[1, 'D_i D_i D_j D_j']]), 2) },
  { name: 'rule orders for a heavy theory without its particle', run: () => ruleOrders({ frame: 'heavy', fields: [], countingRules: [{ name: 'v', kind: 'velocity' }] }, 'v', []) },
  { name: 'rule orders under an unknown rule', run: () => ruleOrders({ fields: [] }, 'nope', []) },
]

const ruleCases: BadInput[] = [
  { name: 'a building block without a weight', run: () => orderOf({ Z: 1 }, { name: 'E/M', kind: 'massRatio' }, sm) },
  { name: 'a negative count of a building block', run: () => orderOf({ H: -1 }, { name: 'E/M', kind: 'massRatio' }, sm) },
  { name: 'an operator without terms', run: () => orderOfOperator({ id: 'empty', terms: [] }, { name: 'E/M', kind: 'massRatio' }, sm) },
  { name: 'a custom rule without weights', run: () => resolveRule({ name: 'x', kind: 'custom' }) },
  { name: 'an empty class', run: () => blocksFromClassKey('  ') },
  { name: 'an unreadable class', run: () => blocksFromClassKey('D^0 H') },
]

const scaleCases: BadInput[] = [
  { name: 'an unknown unit', run: () => toMeV(1, 'kg' as never), says: /use one of/ },
  { name: 'a negative scale', run: () => toMeV(-2, 'MeV') },
  { name: 'a zero scale back from MeV', run: () => fromMeV(0, 'GeV') },
  { name: 'a decimal with a comma', run: () => parseDecimal('1,5') },
  { name: 'a parameter mixing a scale and a number', run: () => buildScaleLadder({ ...ladder, parameters: [{ name: 'x', numerator: 'E', denominator: '2' }] }, [1]) },
  { name: 'a parameter naming no scale', run: () => buildScaleLadder({ ...ladder, parameters: [{ name: 'x', numerator: 'Q', denominator: 'E' }] }, [1]) },
  { name: 'a parameter dividing by zero', run: () => buildScaleLadder({ ...ladder, parameters: [{ name: 'x', numerator: '1', denominator: '0' }] }, []) },
  { name: 'an order without parameters', run: () => buildScaleLadder({ scales: ladder.scales, parameters: [] }, [1]) },
  { name: 'an order under an unknown parameter', run: () => buildScaleLadder(ladder, [{ order: 'a', powers: { zz: 1 } }]) },
  { name: 'a ladder scale in kilograms', run: () => buildScaleLadder({ ...ladder, scales: [{ name: 'E', value: '1', unit: 'kg' as never }] }, []), says: /^Scale 1 "E", unit must be one of/ },
  { name: 'an order list that is not a list of orders', run: () => buildScaleLadder(ladder, [-1]), says: /^Order 1 must be at least 0$/ },
  { name: 'two scales of one name', run: () => buildScaleLadder({ scales: [...ladder.scales, ...ladder.scales], parameters: [] }, []) },
  { name: "an order below a Goldstone theory's leading p²", run: () => buildScaleLadder(ladder, [0, 2, 4], { leadingOrder: 2 }), says: /below the leading order 2/ },
  { name: 'a parameter named like a scale', run: () => buildScaleLadder({ ...ladder, parameters: [{ name: 'E', numerator: 'E', denominator: 'M' }] }, []) },
  { name: 'an unknown counting parameter', run: () => buildScaleLadder({ ...ladder, countingParameter: 'zz' }, []) },
  { name: 'a derived scale named like a scale', run: () => buildScaleLadder({ ...ladder, derived: [{ name: 'E', from: 'M', powers: {} }] }, []) },
  { name: 'a derived scale from an unknown scale', run: () => buildScaleLadder({ ...ladder, derived: [{ name: 'R', from: 'Q', powers: {} }] }, []) },
  { name: 'a derived scale with a negative factor', run: () => buildScaleLadder({ ...ladder, derived: [{ name: 'R', from: 'M', factor: '-1', powers: {} }] }, []) },
  { name: 'a derived scale under an unknown parameter', run: () => buildScaleLadder({ ...ladder, derived: [{ name: 'R', from: 'M', powers: { zz: 1 } }] }, []) },
  { name: 'integrating out nothing', run: () => integrateOut(preset('scalar-qed'), [], { value: 1, unit: 'TeV' }) },
  { name: 'integrating out an unknown field', run: () => integrateOut(preset('scalar-qed'), ['X'], { value: 1, unit: 'TeV' }) },
  { name: 'integrating out a field strength', run: () => integrateOut(preset('scalar-qed'), ['A'], { value: 1, unit: 'TeV' }) },
  { name: 'integrating out a field twice', run: () => integrateOut(preset('smeft'), ['H', 'H'], { value: 1, unit: 'TeV' }) },
  { name: 'integrating out of a heavy-frame theory', run: () => integrateOut(preset('heavy-vexonium'), ['psi'], { value: 1, unit: 'TeV' }) },
  { name: 'threshold shifts of a field strength', run: () => thresholdShifts([{ name: 'G', lorentz: 'field-strength', gaugeOf: 'C' }], []) },
  {
    name: 'integrating out half of a Dirac fermion',
    run: () => integrateOut(preset('qed'), ['eL'], { value: 1, unit: 'TeV' }),
    says: /eL cannot be integrated out without a partner.*Integrate out eL, eR together/,
  },
  { name: 'order 0 of a heavy-frame theory as if relativistic', run: () => orderZero(preset('heavy-vexonium')), says: /uses the heavy frame/ },
  { name: 'heavy order 0 of a theory without a heavy particle', run: () => orderZeroHeavy(preset('qed')), says: /has no heavy particle/ },
  { name: 'a coupling on a class order 0 does not have', run: () => resolveCouplings({ ...phi, couplings: [{ class: 'phi^5', symbol: 'c5' }] }), says: /has no class "phi\^5"/ },
  { name: 'matching a field that is not a heavy real scalar', run: () => matchHeavyScalar(preset('scalar-qed'), 'phi'), says: /"phi" is not a real scalar singlet/ },
  { name: 'couplings in the Goldstone frame', run: () => resolveCouplings({ ...preset('umbral-pions'), couplings: [{ class: 'phi^4', symbol: 'c' }] }), says: /relativistic or heavy-particle frame/ },
]

const runningCases: BadInput[] = [
  {
    name: 'α_s run into the Landau pole',
    run: () => runAlphaS({ alphaS: 0.5, muFrom: 1, muTo: 0.1, loops: 1, lightFlavours: 3 }),
    says: /^α_s grows beyond the perturbative range below μ = [\d.]+ GeV .*; choose a higher scale/,
  },
  { name: 'α_s without quarks or light flavours', run: () => runAlphaS({ alphaS: 0.118, muFrom: 91.1876, muTo: 2, loops: 4 }) },
  { name: 'α_s with five loops', run: () => runAlphaS({ ...qcd, loops: 5 as never }) },
  { name: 'α_s at a negative scale', run: () => runAlphaS({ ...qcd, muTo: -1 }) },
  { name: 'a heavy quark of a kinetic mass', run: () => runAlphaS({ ...qcd, thresholds: [{ name: 'b', mass: 4, kind: 'kinetic' as never }] }) },
  {
    name: 'two heavy quarks of one name',
    run: () =>
      runAlphaS({
        ...qcd,
        thresholds: [
          { name: 'b', mass: 4, kind: 'msbar' },
          { name: 'b', mass: 5, kind: 'msbar' },
        ],
      }),
  },
  {
    name: 'two heavy quarks of one mass',
    run: () =>
      runAlphaS({
        ...qcd,
        thresholds: [
          { name: 'b', mass: 4, kind: 'msbar' },
          { name: 'c', mass: 4, kind: 'msbar' },
        ],
      }),
  },
  { name: 'too many flavours', run: () => runAlphaS({ ...qcd, lightFlavours: 6 }) },
  { name: 'flavours at μ₀ that do not match the quarks', run: () => runAlphaS({ ...qcd, nfFrom: 3 }) },
  { name: 'α_s above 4π', run: () => runAlphaS({ ...qcd, alphaS: 13 }) },
  { name: 'three decoupling loops', run: () => runAlphaS({ ...qcd, decouplingLoops: 3 as never }) },
  { name: 'a large α_s matched up across a threshold', run: () => alphaSAboveThreshold(40, 0, 'pole', 2), says: /too large to match across it/ },
  { name: 'decoupling with three loops', run: () => decouplingFactor(0.1, 0, 'msbar', 3 as never) },
  { name: 'a kinetic heavy-quark mass', run: () => decouplingCoefficients('kinetic' as never) },
  { name: 'seven active flavours in β', run: () => qcdBeta(7) },
  { name: 'α at a negative scale', run: () => runAlphaQED({ muTo: -1 }) },
  { name: 'α into its Landau pole', run: () => runAlphaQED({ muTo: 1e300 }), says: /Landau pole/ },
  { name: 'a negative hadronic shift', run: () => alphaQedAtZ({ deltaAlphaHad5: -1 }) },
  { name: 'W heavier than Z', run: () => alphaQedAtZ({ deltaAlphaHad5: 0.0276, mW: 95 }) },
  { name: 'a leptonic shift at zero', run: () => leptonicShiftOneLoop(0) },
  { name: 'q² above the pair threshold', run: () => vacuumPolarizationOneLoop(5, 1 / 137) },
  { name: 'a vacuum-polarization series of order 0', run: () => vacuumPolarizationSeries(0) },
]

const libraryCases: BadInput[] = [
  { name: 'SU(9)', run: () => suWeights(9, [1, 0, 0, 0, 0, 0, 0, 0]) },
  { name: 'an SU(8) representation of huge dimension', run: () => suDimension(8, [9, 9, 9, 9, 9, 9, 9]) },
  { name: 'a weight of the wrong length', run: () => singletCount(3, new Map([['1', 1]])) },
  { name: 'a non-integer singlet count', run: () => singletCount(2, new Map([['0', 0.5]])) },
  { name: 'an Adams power of 0', run: () => characterPower(3, suWeights(3, [1, 0]), 0) },
  { name: 'characters of different groups', run: () => characterProduct(suWeights(2, [1]), lorentzWeights([1, 0])) },
  { name: 'an empty product group', run: () => productCharacter([]) },
  { name: 'singlets of an empty product group', run: () => productSingletCount([], new Map()) },
  { name: 'a Schur functor of a bad weight', run: () => schurFunctorCharacter(3, new Map([['1', 1]]), [2]) },
  { name: 'irreps times a bad weight', run: () => multiplyIrreps(3, new Map([['1,0', 1]]), new Map([['1', 1]])) },
  { name: 'partitions of different sizes', run: () => symmetricCharacter([2], [1, 1, 1]) },
  { name: 'a plethysm beyond degree 12', run: () => plethysm(3, [1, 0], [13]) },
  { name: 'a fraction over zero', run: () => rat(1, 0) },
  { name: 'a decimal where a fraction is expected', run: () => parseRational('0.5') },
  { name: 'division by zero', run: () => div(ONE, ZERO) },
  { name: 'a fraction taken as a whole number', run: () => toBigInt(parseRational('1/2')) },
  { name: 'a residue with no small fraction', run: () => reconstructRational(3n, 7n) },
  {
    name: 'an inconsistent linear system',
    run: () =>
      solve(
        new PrimeField(7),
        [
          [1, 1],
          [2, 2],
        ],
        [1, 3],
      ),
  },
]

const darkU1 = (n: number): Theory => ({
  name: 'dark',
  frame: 'relativistic',
  groups: Array.from({ length: n }, (_, i) => ({ name: `D${i}`, type: 'U1' as const, gauge: true })),
  fields: [{ name: 'chi', lorentz: 'scalar', charges: { D0: '1' } }],
})
const darkContent = () => gaugeContentOf(darkU1(1))
const gaugeRun = { content: darkContent(), loops: 1 as const, muFromGeV: 10, muToGeV: 100, alpha: { D0: 0.01 } }
const gaugeRunningCases: BadInput[] = [
  { name: 'a tower with no theory', run: () => towerGaugeContent([]), says: /no theory/ },
  {
    name: 'a tower step without its threshold',
    run: () =>
      towerGaugeContent([
        { theory: darkU1(1), thresholdGeV: null },
        { theory: darkU1(1), thresholdGeV: null },
      ]),
    says: /threshold scale/,
  },
  { name: 'more U(1) groups than the mixing follows', run: () => gaugeBetaCoefficients(gaugeContentOf(darkU1(9))), says: /at most 8/ },
  { name: 'a running coupling for a finite group', run: () => simpleGroupFactors({ name: 'Z', type: 'Z', n: 3, gauge: true }), says: /only SU\(N\) and U\(1\)/ },
  { name: 'a gauge running from zero GeV', run: () => runGaugeCouplings({ ...gaugeRun, muFromGeV: 0 }), says: /between/ },
  { name: 'a gauge running with a non-perturbative input', run: () => runGaugeCouplings({ ...gaugeRun, alpha: { D0: 20 } }), says: /not a perturbative coupling/ },
  { name: 'a gauge coupling asked beyond its Landau pole', run: () => gaugeCouplingsAt({ ...gaugeRun, alpha: { D0: 1 }, muToGeV: 1e30 }), says: /cannot be reached/ },
  {
    name: 'a gauge running report of a theory without gauge groups',
    run: () =>
      gaugeRunningReport(gaugeContentOf({ name: 'none', frame: 'relativistic', groups: [], fields: [{ name: 'phi', lorentz: 'scalar', real: true }] }), {
        loops: 1,
        muFromGeV: 10,
        alpha: {},
        plotFromGeV: 1,
        plotToGeV: 100,
      }),
    says: /no gauge group/,
  },
  {
    name: 'a gauge running report over a reversed range',
    run: () => gaugeRunningReport(darkContent(), { loops: 1, muFromGeV: 10, alpha: { D0: 0.01 }, plotFromGeV: 100, plotToGeV: 1 }),
    says: /lower to a higher/,
  },
]

// Group data of SO, Sp, the exceptional and the finite groups, called directly (the schema stops these first).
const groupCases: BadInput[] = [
  { name: 'an irrep name for a Lie group', run: () => repDimension('SO', 10, '3') },
  { name: 'an SO(4) group', run: () => rootSystemOf('SO', 4) },
  { name: 'an E8 irrep beyond exact arithmetic', run: () => lieDimension(rootSystemOf('E8'), [12, 12, 12, 12, 12, 12, 12, 12]) },
  { name: 'weights of an E8 irrep too large to list', run: () => lieWeights(rootSystemOf('E8'), [1, 1, 0, 0, 0, 0, 0, 0]) },
  { name: 'a plethysm with a bad partition', run: () => liePlethysm(rootSystemOf('G2'), [1, 0], [1, 2]) },
  { name: 'a G2 character with a one-label weight', run: () => lieSingletCount(rootSystemOf('G2'), new Map([['1', 1]])) },
  { name: 'an unknown finite group', run: () => finiteGroup('A5' as FiniteKind) },
  { name: 'an unknown irrep of A4', run: () => irrepIndex(finiteGroup('A4'), '4') },
  { name: 'an Adams power of 0', run: () => adamsClass(finiteGroup('A4'), finiteGroup('A4').irreps[3]!.chi, 0) },
  { name: 'a CP-twisted Lorentz series to 41 derivatives', run: () => cpLorentzSeries([], 41) },
  { name: 'a real SU(2) irrep with an odd middle label', run: () => mixedTensorShape(2, [1]) },
]

export const BAD_INPUTS: BadInput[] = [
  ...theoryCases,
  ...basisCases,
  ...heavyCases,
  ...ruleCases,
  ...scaleCases,
  ...runningCases,
  ...gaugeRunningCases,
  ...goldstoneCases,
  ...notationCases,
  ...libraryCases,
  ...groupCases,
]
