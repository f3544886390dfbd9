import { createHash } from 'node:crypto'

// The Content-Security-Policy of the app's pages. Scripts run only from our own origin or when
// they are exactly the inline scripts Nuxt wrote into this page (the import map and the config
// line): their SHA-256 hashes are listed, so no injected script can run. Styles allow inline
// ones, because KaTeX and Vue's style bindings render style attributes. No page may be framed.

/** The inline scripts of an HTML page (JSON data blocks excluded: they never run). */
export function inlineScripts(html: string): string[] {
  const out: string[] = []
  for (const m of html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/gi)) {
    const attrs = m[1]!
    if (/\bsrc\s*=/i.test(attrs) || /\btype\s*=\s*["']?application\/(ld\+)?json/i.test(attrs)) continue
    out.push(m[2]!)
  }
  return out
}

/** The policy for one rendered page. */
export function pageCsp(html: string): string {
  const hashes = inlineScripts(html).map((s) => `'sha256-${createHash('sha256').update(s, 'utf8').digest('base64')}'`)
  return [
    "default-src 'self'",
    `script-src 'self' ${[...new Set(hashes)].join(' ')}`.trim(),
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data:",
    "font-src 'self' data:",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ')
}

/** Headers for every answer; API answers (JSON, exports) also get a policy that allows nothing. */
export const COMMON_HEADERS = {
  'x-content-type-options': 'nosniff',
  'referrer-policy': 'same-origin',
  'x-frame-options': 'DENY',
} as const
export const API_CSP = "default-src 'none'; frame-ancestors 'none'"
