/**
 * LaTeX of a Goldstone-frame class key: "{u,χ−,f−}^2 χ+ f+^2" → "\{u,\chi_-,f_-\}^{2}\,\chi_+\,f_+^{2}".
 * @example goldstoneClassTex('χ+^2') // "\\chi_+^{2}"
 */
export function goldstoneClassTex(key: string): string {
  const letter: Record<string, string> = { u: 'u', 'χ+': '\\chi_+', 'χ−': '\\chi_-', 'f+': 'f_+', 'f−': 'f_-' }
  return key
    .split(' ')
    .filter(Boolean)
    .map((part) => {
      const [name, power] = part.split('^') as [string, string | undefined]
      const body = name.startsWith('{')
        ? `\\{${name
            .slice(1, -1)
            .split(',')
            .map((x) => letter[x] ?? x)
            .join(',')}\\}`
        : (letter[name] ?? name)
      return power ? `${body}^{${power}}` : body
    })
    .join('\\,')
}
