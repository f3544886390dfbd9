/**
 * Count classes grouped as the basis board groups them: a class and its conjugate (every
 * complex field conjugated, left- and right-handed field strengths swapped) form one entry,
 * named by the member with fewer conjugated fields and right-handed strengths (the smaller key
 * on a tie), and counted
 * with both members' operators (the real parameters of the pair). A class equal to its own
 * conjugate stays alone. Works on class keys as written ("D^2 H^2 H*^2", "G_L^3").
 * @example pairConjugateClasses({ 'G_L^3': 1, 'G_R^3': 1, 'D^2 H^2 H*^2': 2 })
 *   // [{ key: 'G_L^3', conjugate: 'G_R^3', count: 2 }, { key: 'D^2 H^2 H*^2', conjugate: null, count: 2 }]
 */
export interface ClassPair {
  key: string
  conjugate: string | null
  count: number
}

const PART = /^([A-Za-z][A-Za-z0-9_]*?)(_[LR])?(\*)?(?:\^(\d+))?$/

export function pairConjugateClasses(classes: Readonly<Record<string, number>>): ClassPair[] {
  const keys = Object.keys(classes)
  // A field is complex when some class holds its conjugate; a real scalar never carries "*".
  const complex = new Set(
    keys.flatMap((k) =>
      k
        .split(' ')
        .map((p) => PART.exec(p))
        .filter((m) => m?.[3])
        .map((m) => m![1]!),
    ),
  )
  const bySignature = new Map(keys.map((k) => [signature(k.split(' ')), k]))
  const done = new Set<string>()
  const out: ClassPair[] = []
  for (const key of keys) {
    if (done.has(key)) continue
    const partner = bySignature.get(signature(key.split(' ').map((p) => conjugatePart(p, complex))))
    const pair = partner !== undefined && partner !== key ? partner : null
    done.add(key)
    if (pair) done.add(pair)
    const [first, second] = pair && (weight(pair) < weight(key) || (weight(pair) === weight(key) && pair < key)) ? [pair, key] : [key, pair]
    out.push({ key: first, conjugate: second, count: classes[key]! + (pair ? classes[pair]! : 0) })
  }
  return out
}

function conjugatePart(part: string, complex: Set<string>): string {
  const m = PART.exec(part)
  if (!m) return part
  const [, name, chiral, star, power] = m
  const side = chiral === '_L' ? '_R' : chiral === '_R' ? '_L' : ''
  const conj = !chiral && complex.has(name!) ? (star ? '' : '*') : ''
  return `${name}${side}${conj}${power ? `^${power}` : ''}`
}

const signature = (parts: string[]) => [...parts].sort().join(' ')
// Conjugated legs (a right-handed strength counts as one), with their powers; the board's rule
// (server/engine/basis/buildBasis.ts, representative), ties going to the smaller key.
const weight = (key: string) =>
  key
    .split(' ')
    .map((p) => PART.exec(p))
    .reduce((s, m) => s + (m && (m[3] || m[2] === '_R') ? Number(m[4] ?? 1) : 0), 0)
