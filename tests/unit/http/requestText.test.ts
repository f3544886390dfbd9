import { describe, it, expect } from 'vitest'
import { createHash } from 'node:crypto'
import { nulPlace, nulMessage } from '../../../server/utils/http/nulText'
import { inlineScripts, pageCsp } from '../../../server/utils/http/pageCsp'
import { forbiddenIn } from '../../support/forbiddenMessages'

// Pure helpers of the request guards (issue 12, item 6).
describe('nulPlace and nulMessage', () => {
  it.each([
    [{ body: 'ok' }, null, ''],
    [{ body: 'a\u0000b' }, ['body'], 'Note cannot contain the NUL character (U+0000); remove it'],
    [{ definition: { fields: [{ name: 'phi' }, { name: 'x\u0000' }] } }, ['definition', 'fields', 1, 'name'], 'Field 2 "x\u2400", name cannot contain the NUL character (U+0000); remove it'],
    [['ok', ['deep\u0000']], [1, 0], 'Entry 2, entry 1 cannot contain the NUL character (U+0000); remove it'],
    [{ 'key\u0000': 1 }, [], 'The request has a key containing the NUL character (U+0000); remove it'],
    ['\u0000', [], 'The request cannot contain the NUL character (U+0000); remove it'],
    [{ n: 1, b: true, z: null }, null, ''],
  ])('%j → %j: %s', (value, path, message) => {
    const place = nulPlace(value)
    expect(place?.path ?? null).toEqual(path)
    if (place) {
      expect(nulMessage(place, value)).toBe(message)
      expect(forbiddenIn(message)).toEqual([])
    }
  })
})

describe("the pages' Content-Security-Policy", () => {
  const html =
    '<html><head><script type="importmap">{"imports":{}}</script><script type="module" src="/_nuxt/a.js"></script>' +
    '<script>window.__NUXT__={}</script></head><body><script type="application/json" id="__NUXT_DATA__">[1]</script></body></html>'
  const sha = (s: string) => `'sha256-${createHash('sha256').update(s).digest('base64')}'`

  it('finds the inline scripts that run, not external ones or JSON data', () => {
    expect(inlineScripts(html)).toEqual(['{"imports":{}}', 'window.__NUXT__={}'])
  })

  it('allows exactly those scripts by hash, no inline or eval, and no framing', () => {
    const csp = pageCsp(html)
    expect(csp).toContain(`script-src 'self' ${sha('{"imports":{}}')} ${sha('window.__NUXT__={}')};`)
    expect(csp).not.toMatch(/script-src[^;]*unsafe/)
    expect(csp).toContain("frame-ancestors 'none'")
    expect(csp).toContain("object-src 'none'")
  })
})
