/** A class key such as "D^2 H^2 H*^2" or "G_L^3" as LaTeX (auto-imported in app and server). */
export function classKeyTex(key: string): string {
  return key.split(' ').map((part) => {
    const m = /^([A-Za-z][A-Za-z0-9]*?)(_[LR])?(\*)?(?:\^(\d+))?$/.exec(part)
    if (!m) return part.replace(/([&%$#_{}])/g, '\\$1')
    const [, name, chiral, star, power] = m
    const sub = chiral ? `_{${chiral.slice(1)}}` : ''
    const sup = [star ? '*' : '', power ?? ''].join('')
    return `${name!.length > 1 ? `\\mathrm{${name}}` : name}${sub}${sup ? `^{${sup}}` : ''}`
  }).join('\\,')
}
