import { chromium, type Browser, type Page } from 'playwright-core'
import { mkdirSync } from 'node:fs'
import { join, resolve } from 'node:path'

// Debian's Chromium driven by playwright-core; never a downloaded browser.
const FLAGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync']
export const SCREENSHOTS = resolve(import.meta.dirname, '..', '..', 'test-results', 'screenshots')

// Content-Security-Policy violations that Chromium logged in any page of a browser launched
// here. The pages must work under the policy the server sends, so closing a browser (every
// e2e file does in afterAll) fails when any was seen.
const violations = new WeakMap<Browser, string[]>()

export async function launchBrowser(): Promise<Browser> {
  mkdirSync(SCREENSHOTS, { recursive: true })
  // playwright gives every launch a fresh temporary profile (user data dir) of its own.
  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: FLAGS })
  const seen: string[] = []
  violations.set(browser, seen)
  const close = browser.close.bind(browser)
  browser.close = async (options) => {
    await close(options)
    if (seen.length) throw new Error(`Content-Security-Policy violations in the browser console:\n${seen.join('\n')}`)
  }
  return browser
}

export async function newPage(browser: Browser, baseURL: string): Promise<Page> {
  const context = await browser.newContext({ baseURL, viewport: { width: 1280, height: 900 } })
  context.on('console', (message) => {
    if (/Content Security Policy/i.test(message.text())) violations.get(browser)?.push(`${message.location().url}: ${message.text()}`)
  })
  return context.newPage()
}

export async function screenshot(page: Page, name: string) {
  await page.screenshot({ path: join(SCREENSHOTS, `${name}.png`), fullPage: true })
}

/** Wait until Nuxt has hydrated the page, so that clicks reach Vue handlers. */
export async function hydrated(page: Page) {
  await page.waitForFunction(() => (window as unknown as { useNuxtApp?: unknown }).useNuxtApp !== undefined || document.querySelector('#__nuxt')?.getAttribute('data-v-app') !== null, undefined, {
    timeout: 15_000,
  })
}
