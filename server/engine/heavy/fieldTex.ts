/**
 * LaTeX of a field name as the theory spells it: Greek names become their letters, a trailing
 * "bar" becomes an overbar, trailing digits a subscript; other names print upright.
 * @example fieldTex('psi') // "\\psi"; fieldTex('Nbar') // "\\bar{N}"; fieldTex('chi2') // "\\chi_{2}"
 */
const GREEK = new Set([
  'alpha',
  'beta',
  'gamma',
  'delta',
  'epsilon',
  'zeta',
  'eta',
  'theta',
  'iota',
  'kappa',
  'lambda',
  'mu',
  'nu',
  'xi',
  'pi',
  'rho',
  'sigma',
  'tau',
  'upsilon',
  'phi',
  'chi',
  'psi',
  'omega',
  'Gamma',
  'Delta',
  'Theta',
  'Lambda',
  'Xi',
  'Pi',
  'Sigma',
  'Upsilon',
  'Phi',
  'Psi',
  'Omega',
])

function baseTex(base: string): string {
  if (GREEK.has(base)) return `\\${base}`
  if (base.length === 1) return base
  return `\\mathrm{${base.replace(/_/g, '\\_')}}`
}

export function fieldTex(name: string): string {
  const m = /^([A-Za-z][A-Za-z_]*?)(bar)?(\d*)$/.exec(name)
  if (!m) return `\\mathrm{${name.replace(/_/g, '\\_')}}`
  const [, base, bar, digits] = m
  const core = bar && base ? `\\bar{${baseTex(base)}}` : baseTex(`${base}${bar ?? ''}`)
  return digits ? `${core}_{${digits}}` : core
}
