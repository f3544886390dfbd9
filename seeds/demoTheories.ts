// Theory files of the demo study (invented). Presets shipped with the app are added as well.
export const DEMO_THEORIES = [
  {
    name: 'Hidden photon with tarnion',
    description: 'Invented full theory: a Dirac “tarnion” T (two Weyl fields) of hidden charge 1 and a light real scalar s, coupled to a hidden U(1).',
    frame: 'relativistic',
    groups: [{ name: 'Uh', type: 'U1', gauge: true }],
    fields: [
      { name: 'TL', lorentz: 'L', charges: { Uh: '1' } },
      { name: 'TR', lorentz: 'R', charges: { Uh: '1' } },
      { name: 's', lorentz: 'S', real: true },
      { name: 'A', lorentz: 'F', gaugeOf: 'Uh' },
    ],
  },
  {
    name: 'Hidden photons below the tarnion',
    description: 'Invented low-energy theory: the tarnion integrated out, the hidden photon and the scalar remain.',
    frame: 'relativistic',
    groups: [{ name: 'Uh', type: 'U1', gauge: true }],
    fields: [
      { name: 's', lorentz: 'S', real: true },
      { name: 'A', lorentz: 'F', gaugeOf: 'Uh' },
    ],
  },
]
