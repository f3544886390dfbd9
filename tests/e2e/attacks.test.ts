import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest'
import type { Browser, BrowserContext } from 'playwright-core'
import { createServer, type Server } from 'node:http'
import type { AddressInfo } from 'node:net'
import { launchBrowser, newPage, hydrated } from '../support/browser'
import { signedUpClient, uniqueEmail, ApiClient } from '../support/client'
import { signUpInBrowser } from '../support/signUp'
import { SMALL_THEORY } from '../support/fixtures'
import { testDb } from '../support/db'

// Issue 12 in a real browser: a page on another port of the same host (same site, so the
// SameSite=Lax session cookie goes along) posts to the API the two ways a page can without the
// server's consent; and signing out in the browser ends the session for a copied cookie too.
let browser: Browser
let attacker: Server
let attackerUrl: string
const base = () => inject('baseUrl')

/** The hostile page: a text/plain form whose body is valid JSON, and a no-cors fetch. */
function hostilePage(theoryId: number): string {
  const target = `${base()}/api/theories/${theoryId}/annotations`
  return `<!DOCTYPE html><html><body>
<form id="f" method="POST" action="${target}" enctype="text/plain"><input name='{"body":"planted by a form' value='"}'></form>
<script>
fetch(${JSON.stringify(target)}, { method: 'POST', mode: 'no-cors', credentials: 'include', body: JSON.stringify({ body: 'planted by a fetch' }) })
  .finally(() => { document.title = 'fetched'; document.getElementById('f').submit() })
</script></body></html>`
}

beforeAll(async () => {
  browser = await launchBrowser()
  attacker = createServer((req, res) => {
    res.setHeader('content-type', 'text/html')
    res.end(hostilePage(Number(new URL(req.url!, 'http://x').searchParams.get('theory'))))
  })
  await new Promise<void>((resolve) => attacker.listen(0, '127.0.0.1', resolve))
  attackerUrl = `http://127.0.0.1:${(attacker.address() as AddressInfo).port}`
})
afterAll(async () => {
  attacker?.close()
  await browser?.close()
})

/** A browser context signed in as `cookie` (made without newPage's console watch: the hostile page is not ours). */
async function victimContext(cookie: string): Promise<BrowserContext> {
  const context = await browser.newContext({ baseURL: base() })
  const [name, value] = [cookie.slice(0, cookie.indexOf('=')), cookie.slice(cookie.indexOf('=') + 1)]
  await context.addCookies([{ name, value, url: base(), sameSite: 'Lax', httpOnly: true }])
  return context
}

describe('a hostile page of the same site', () => {
  it("cannot post a note with the victim's cookie, by form or by fetch; the app's own page can", async () => {
    const victim = await signedUpClient('victim')
    const slug = `csrf-${Date.now().toString(36)}`
    expect((await victim.client.post('/api/groups', { slug, name: 'Victim group' })).status).toBe(201)
    const theory = await victim.client.post(`/api/groups/${slug}/theories`, { definition: { ...SMALL_THEORY, name: 'Victim theory' } })
    const theoryId = theory.body.theory.id as number
    const context = await victimContext(victim.client.cookie)
    const page = await context.newPage()
    const sent: number[] = []
    page.on('response', (r) => {
      if (r.url().includes('/annotations')) sent.push(r.status())
    })
    await page.goto(`${attackerUrl}/?theory=${theoryId}`)
    await expect.poll(() => sent.length, { timeout: 15_000 }).toBeGreaterThanOrEqual(1)
    await page.waitForLoadState('load')
    // Both requests reached the server and were refused as another site's (the page sees neither answer).
    expect(new Set(sent), JSON.stringify(sent)).toEqual(new Set([403]))
    expect(await testDb()('annotations').where({ theory_id: theoryId }).count('id as n').first()).toEqual({ n: '0' })

    const own = await context.newPage()
    await own.goto(`/groups/${slug}`)
    await hydrated(own)
    const status = await own.evaluate(
      async (id) => (await fetch(`/api/theories/${id}/annotations`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ body: 'from our own page' }) })).status,
      theoryId,
    )
    expect(status).toBe(201)
    await context.close()
  })
})

describe('signing out in the browser', () => {
  it('ends the session on the server: a copy of the cookie is refused at once', async () => {
    const page = await newPage(browser, base())
    await signUpInBrowser(page, 'Leaving Tester', uniqueEmail('leaving-e2e'))
    const cookie = (await page.context().cookies()).find((c) => c.name === 'nuxt-session')!
    const copy = new ApiClient()
    copy.cookie = `${cookie.name}=${cookie.value}`
    expect((await copy.get('/api/auth/me')).status).toBe(200)
    await page.getByRole('button', { name: 'Sign out' }).click()
    await page.waitForURL('**/signin')
    expect((await copy.get('/api/auth/me')).status).toBe(401)
    expect((await copy.post('/api/groups', { slug: `late-${Date.now().toString(36)}`, name: 'Too late' })).status).toBe(401)
  })
})

describe("the pages' Content-Security-Policy", () => {
  it('stops a script injected into a page, and the e2e check reports the violation', async () => {
    const own = await launchBrowser() // its own browser: the violation is expected here
    const page = await newPage(own, base())
    await page.goto('/signin')
    await hydrated(page)
    await page.evaluate(() => {
      const s = document.createElement('script')
      s.textContent = 'window.injected = 1'
      document.body.appendChild(s)
    })
    expect(await page.evaluate(() => (window as unknown as { injected?: number }).injected)).toBeUndefined()
    await expect(own.close()).rejects.toThrow(/Content-Security-Policy violations/)
  })
})
