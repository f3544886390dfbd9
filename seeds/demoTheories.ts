// Theory files of the demo study (invented), plus two shipped presets the group works with.
import { findPreset } from '../shared/presets/index'

export const DEMO_THEORIES = [
  {
    name: 'Hidden photon with tarnion',
    description: 'Invented full theory: a Dirac “tarnion” T (two Weyl fields) of hidden charge 1 and a light real scalar s, coupled to a hidden U(1).',
    frame: 'relativistic',
    groups: [{ name: 'Uh', type: 'U1', gauge: true }],
    fields: [
      { name: 'TL', lorentz: 'left-weyl', charges: { Uh: '1' } },
      { name: 'TR', lorentz: 'right-weyl', charges: { Uh: '1' } },
      { name: 's', lorentz: 'scalar', real: true },
      { name: 'A', lorentz: 'field-strength', gaugeOf: 'Uh' },
    ],
  },
  {
    name: 'Hidden photons below the tarnion',
    description: 'Invented low-energy theory: the tarnion integrated out, the hidden photon and the scalar remain.',
    frame: 'relativistic',
    groups: [{ name: 'Uh', type: 'U1', gauge: true }],
    fields: [
      { name: 's', lorentz: 'scalar', real: true },
      { name: 'A', lorentz: 'field-strength', gaugeOf: 'Uh' },
    ],
  },
  { ...findPreset('heavy-vexonium')!.theory, name: 'Vexonium in the heavy-particle frame' },
  { ...findPreset('smeft')!.theory, name: 'SMEFT (reference)' },
]

/** Runs the demo starts on first boot, so the board has results to show. */
export const DEMO_RUNS = [
  { theory: 'Hidden photon with tarnion', kind: 'basis', maxDim: 8 },
  { theory: 'Hidden photons below the tarnion', kind: 'basis', maxDim: 8 },
  { theory: 'Vexonium in the heavy-particle frame', kind: 'basis', maxDim: 5 },
  { theory: 'SMEFT (reference)', kind: 'basis', maxDim: 6, nf: 1 },
] as const

/**
 * The demo study's scale ladder (invented numbers): a 40 GeV tarnion probed at 2 GeV, so the
 * expansion parameter E/M_T = 1/20; orders below a 10^-4 precision target may be set aside.
 */
export const DEMO_LADDER = {
  theory: 'Hidden photon with tarnion',
  ladder: {
    scales: [
      { name: 'M_T', value: '40', unit: 'GeV' },
      { name: 'E', value: '2', unit: 'GeV' },
      { name: 'R', value: '0.5', unit: 'fm' },
    ],
    parameters: [{ name: 'eps', numerator: 'E', denominator: 'M_T' }],
    precisionTarget: 1e-4,
    countingParameter: 'eps',
    orders: [0, 1, 2, 3, 4],
  },
}
