/**
 * Text for a LaTeX comment line (`% …`), which people read and TeX skips: one line (every line
 * break and other white space becomes one space, so the text cannot leave the comment),
 * control characters dropped, Unicode kept as written (χ, ψ†, μ read better than their TeX
 * escapes), and a backslash printed as \textbackslash{} so no command name appears whole.
 * @example commentText('χ† χ\n\\input{x}') // "χ† χ \\textbackslash{}input{x}"
 */
export function commentText(text: string): string {
  return text
    .normalize('NFC')
    .replace(/[\t\n\v\f\r \u0085\u00a0\u1680\u2000-\u200a\u2028\u2029\u202f\u205f\u3000\ufeff]+/g, ' ')
    .replace(/[\u0000-\u001f\u007f-\u009f\u200b-\u200d\u2060]/g, '')
    .replace(/\\/g, '\\textbackslash{}')
    .trim()
}
