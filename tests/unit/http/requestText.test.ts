import { describe, it, expect } from 'vitest'
import { createHash } from 'node:crypto'
import { nulPath, nulMessage } from '../../../server/utils/http/nulText'
import { inlineScripts, pageCsp } from '../../../server/utils/http/pageCsp'

// Pure helpers of the request guards (issue 12, item 6).
describe('nulPath', () => {
  it.each([
    [{ body: 'ok' }, null],
    [{ body: 'a\u0000b' }, 'body'],
    [{ definition: { fields: [{ name: 'phi' }, { name: 'x\u0000' }] } }, 'definition.fields[1].name'],
    [['ok', ['deep\u0000']], '[1][0]'],
    [{ 'key\u0000': 1 }, 'key\\0'],
    ['\u0000', 'body'],
    [{ n: 1, b: true, z: null }, null],
  ])('%j → %j', (value, path) => {
    expect(nulPath(value)).toBe(path)
  })

  it('says what to do', () => {
    expect(nulMessage('body')).toBe('body: text may not contain the NUL character (U+0000); remove it')
  })
})

describe('the pages\' Content-Security-Policy', () => {
  const html = '<html><head><script type="importmap">{"imports":{}}</script><script type="module" src="/_nuxt/a.js"></script>'
    + '<script>window.__NUXT__={}</script></head><body><script type="application/json" id="__NUXT_DATA__">[1]</script></body></html>'
  const sha = (s: string) => `'sha256-${createHash('sha256').update(s).digest('base64')}'`

  it('finds the inline scripts that run, not external ones or JSON data', () => {
    expect(inlineScripts(html)).toEqual(['{"imports":{}}', 'window.__NUXT__={}'])
  })

  it('allows exactly those scripts by hash, no inline or eval, and no framing', () => {
    const csp = pageCsp(html)
    expect(csp).toContain(`script-src 'self' ${sha('{"imports":{}}')} ${sha('window.__NUXT__={}')};`)
    expect(csp).not.toMatch(/script-src[^;]*unsafe/)
    expect(csp).toContain('frame-ancestors \'none\'')
    expect(csp).toContain('object-src \'none\'')
  })
})
