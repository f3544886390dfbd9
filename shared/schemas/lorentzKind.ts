/**
 * Lorentz kinds of the theory file's `lorentz` key, in our own words:
 * - "scalar": a (0,0) field, complex unless declared `real`;
 * - "left-weyl": a left-handed Weyl fermion, Lorentz (1/2,0);
 * - "right-weyl": a right-handed Weyl fermion, Lorentz (0,1/2);
 * - "field-strength": the field strength of the gauge group `gaugeOf`, both chiral halves
 *   (1,0) and (0,1), real and in its adjoint.
 * Early theory files wrote one letter per kind; those are refused with the new word.
 */
export const LORENTZ_KINDS = ['scalar', 'left-weyl', 'right-weyl', 'field-strength'] as const
export type LorentzKind = (typeof LORENTZ_KINDS)[number]

/** A short description of each kind for forms and the roster. */
export const LORENTZ_KIND_TITLES: Record<LorentzKind, string> = {
  scalar: 'scalar (0,0)',
  'left-weyl': 'left-handed Weyl fermion (1/2,0)',
  'right-weyl': 'right-handed Weyl fermion (0,1/2)',
  'field-strength': 'gauge field strength (1,0)+(0,1)',
}

/** The one-letter spellings of early theory files and the word that replaces each. */
const OLD_LETTERS: Readonly<Record<string, LorentzKind>> = { S: 'scalar', L: 'left-weyl', R: 'right-weyl', F: 'field-strength' }

/**
 * The message for a `lorentz` value that is not a Lorentz kind, naming the words to write.
 * The theory-file reader puts the field and key in front ('Field 3 "H", Lorentz kind: ').
 * @example lorentzKindMessage('S') // '"S" is the old one-letter spelling; write "scalar" (the other Lorentz kinds are "left-weyl", "right-weyl", "field-strength")'
 */
export function lorentzKindMessage(value: unknown): string {
  const word = typeof value === 'string' ? OLD_LETTERS[value] : undefined
  if (word !== undefined) {
    const others = LORENTZ_KINDS.filter((k) => k !== word)
      .map((k) => `"${k}"`)
      .join(', ')
    return `"${value}" is the old one-letter spelling; write "${word}" (the other Lorentz kinds are ${others})`
  }
  const all = LORENTZ_KINDS.map((k) => `"${k}"`).join(', ')
  if (value === undefined) return `is required: write one of ${all}`
  return `${String(JSON.stringify(value)).slice(0, 40)} is not a Lorentz kind; write one of ${all}`
}
