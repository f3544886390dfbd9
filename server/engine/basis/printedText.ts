// Whether a typed operator is in printed notation (papers' LaTeX or plain text) rather than the
// bracket syntax: letters or backslashes beyond the bracket syntax's own words.
export function looksPrinted(text: string): boolean {
  return /[A-Za-z\\]/.test(
    text
      .replace(/\{\s*g\s*:\s*\d+\s*\}/g, '')
      .replace(/\bs\s*\d\d/g, '')
      .replace(/h\.c\./g, '')
      .replace(/\bP\b/g, ''),
  )
}
