// The words a message uses for the keys of request bodies, theory files and scale ladders, so
// that a problem is named as the form or the file shows it ("maximum dimension", not "maxDim").
// Every key a route body can carry has an entry (tests/api/badInput checks it).

export const KEY_WORDS: Record<string, string> = {
  // accounts, groups, sharing
  email: 'e-mail address', password: 'password', displayName: 'name', current: 'current password',
  invitation: 'invitation', token: 'link', slug: 'short name', name: 'name', description: 'description',
  role: 'role', siteRole: 'site role', expiresInDays: 'days until the link expires',
  // theory files
  definition: 'theory', theory: 'theory', version: 'version you edited', frame: 'frame', maxOrder: 'maximum order',
  groups: 'symmetries', fields: 'fields', countingRules: 'counting rules', heavy: 'heavy particle',
  lorentz: 'Lorentz kind', reps: 'representations', charges: 'charges', real: 'real', flavors: 'flavors', display: 'display form',
  gaugeOf: 'gauge group of the field strength', type: 'kind', n: 'n', gauge: 'gauge', kind: 'kind',
  weights: 'weights', offset: 'offset', parameter: 'expansion parameter', symbol: 'symbol',
  particle: 'particle field', antiparticle: 'antiparticle field', gaugeGroup: 'gauge group',
  imposeParity: 'parity imposed', imposeTimeReversal: 'time reversal imposed',
  // runs, board, notes
  maxDim: 'maximum dimension', nf: 'number of flavors', priorities: 'priorities',
  derivativesOn: 'fields that preferably carry the derivatives', preferHermitian: 'preference for Hermitian combinations',
  keepFromBasis: 'basis to keep operators from', column: 'column', position: 'position', label: 'label',
  classKey: 'class', text: 'operator', body: 'note', operatorId: 'operator', format: 'file format',
  formatVersion: 'file format version', orders: 'orders', classes: 'classes', operators: 'operators',
  order: 'order', key: 'class', countingRule: 'counting rule', note: 'note', exportedAt: 'export date',
  // scales, towers, running couplings
  ladder: 'scale ladder', scales: 'scales', parameters: 'expansion parameters', derived: 'derived scales',
  value: 'value', unit: 'unit', numerator: 'numerator', denominator: 'denominator', from: 'base scale',
  factor: 'factor', powers: 'powers', precisionTarget: 'precision target', countingParameter: 'counting parameter',
  target: 'precision target', scale: 'threshold scale', alphaS: 'α_s', muFrom: 'starting scale μ₀',
  muTo: 'wanted scale μ', loops: 'loops in β', thresholds: 'heavy quarks', mass: 'mass', lightFlavours: 'light flavours',
  decouplingLoops: 'decoupling loops', plotFrom: 'start of the plot', plotTo: 'end of the plot',
  alphaInverse0: 'α(0)⁻¹', quarks: 'quark thresholds', deltaAlphaHad5: 'Δα_had⁽⁵⁾(M_Z²)',
  muFromGeV: 'scale of the inputs', muToGeV: 'chosen scale', alpha: 'α per gauge group', mixing: 'kinetic mixing',
  epsilon: 'ε', plotFromGeV: 'lowest plotted scale', plotToGeV: 'highest plotted scale',
}

/** A list key and the word for one of its entries ("field 3"). */
export const ENTRY_WORDS: Record<string, string> = {
  fields: 'field', groups: 'symmetry', countingRules: 'counting rule', scales: 'scale', parameters: 'expansion parameter',
  derived: 'derived scale', thresholds: 'heavy quark', orders: 'order', classes: 'class', operators: 'operator',
  derivativesOn: 'derivative field',
}

/** A record key and the words for one of its entries ("charge under Y"). */
export const RECORD_WORDS: Record<string, (key: string) => string> = {
  reps: (k) => `representation under ${k}`,
  charges: (k) => `charge under ${k}`,
  weights: (k) => `weight of ${k}`,
  powers: (k) => `power of ${k}`,
  alpha: (k) => `α of ${k}`,
}

/** Keys that only wrap a document: a problem inside is named by the document's own words. */
export const WRAPPER_KEYS = new Set(['definition', 'theory', 'ladder', 'priorities'])
