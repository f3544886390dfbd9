// The demo cast: an invented research group and invented people (no real persons).
export const DEMO_PASSWORD = 'scalewright-demo'

export const DEMO_ADMIN = { email: 'admin@scalewright.test', displayName: 'Site Admin' }

export const DEMO_GROUP = {
  slug: 'tarn-valley',
  name: 'Tarn Valley Few-Body Collective',
  description: 'An invented group studying an invented dark sector: a heavy “tarnion” fermion bound by a light hidden photon, and the effective theories below its mass.',
}

export const DEMO_MEMBERS = [
  { email: 'ilse.marrow@scalewright.test', displayName: 'Ilse Marrow', role: 'owner' },
  { email: 'quentin.oyelaran@scalewright.test', displayName: 'Quentin Oyelaran', role: 'editor' },
  { email: 'saoirse.batbayar@scalewright.test', displayName: 'Saoirse Batbayar', role: 'commenter' },
  { email: 'henrik.adeyemi@scalewright.test', displayName: 'Henrik Adeyemi', role: 'viewer' },
] as const
