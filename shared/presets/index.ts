/**
 * Theory presets shipped with Scalewright (valid under TheorySchema). Each entry has an id
 * (also accepted by the CLI instead of a file name), a title and a one-line description.
 * Presets with frame "heavy" are for the heavy-particle engine; the Hilbert-series count refuses them.
 */
import type { Theory } from '../schemas/theory'
import smeft from './smeft.json'
import realScalar from './real-scalar.json'
import photons from './photons.json'
import qed from './qed.json'
import scalarQed from './scalar-qed.json'
import qcdLike from './qcd-like.json'
import heavyVexonium from './heavy-vexonium.json'
import umbralPions from './umbral-pions.json'
import smeftU35 from './smeft-u3-5.json'

export interface Preset {
  id: string
  title: string
  description: string
  theory: Theory
}

export const PRESETS: readonly Preset[] = [
  { id: 'smeft', title: 'Standard Model (SMEFT)', description: 'Q, u, d, L, e with 3 flavors, the Higgs doublet H and the gauge fields G, W, B.', theory: smeft as Theory },
  { id: 'real-scalar', title: 'One real scalar', description: 'A single real scalar φ without symmetries.', theory: realScalar as Theory },
  { id: 'photons', title: 'Photons only', description: 'Pure U(1) gauge field: Euler–Heisenberg-type photon self-interactions.', theory: photons as Theory },
  { id: 'qed', title: 'QED', description: 'One Dirac fermion of charge −1 (two Weyl fields) and the photon.', theory: qed as Theory },
  { id: 'scalar-qed', title: 'Scalar QED', description: 'A complex scalar of charge 1 and the photon.', theory: scalarQed as Theory },
  { id: 'qcd-like', title: 'QCD-like', description: 'SU(3) gauge theory with 2 Dirac quark flavors and the gluon.', theory: qcdLike as Theory },
  {
    id: 'smeft-u3-5',
    title: 'SMEFT with U(3)^5 flavour symmetry',
    description: 'One copy of each SM field; the flavour group U(3)^5 written as SU(3)^5 × U(1)^5 (13 groups in all).',
    theory: smeftU35 as Theory,
  },
  // written by the heavy-particle helper; frame "heavy" (not counted by the Hilbert series)
  {
    id: 'heavy-vexonium',
    title: 'Vexonium (heavy frame)',
    description: 'A heavy fermion and its antiparticle bound by a dark U(1), in the heavy-particle frame.',
    theory: heavyVexonium as unknown as Theory,
  },
  // frame "goldstone": counted and built per chiral order (server/engine/goldstone)
  {
    id: 'umbral-pions',
    title: 'Umbral pions (Goldstone frame)',
    description: 'Eight light pions of a hidden confining sector with three light flavors, with scalar and vector sources, to p⁶.',
    theory: umbralPions as unknown as Theory,
  },
]

/** The preset with this id, or undefined. */
export function findPreset(id: string): Preset | undefined {
  return PRESETS.find((p) => p.id === id)
}
