import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest'
import type { Browser } from 'playwright-core'
import { launchBrowser, newPage, screenshot, hydrated } from '../support/browser'
import { uniqueEmail } from '../support/client'

let browser: Browser
beforeAll(async () => { browser = await launchBrowser() })
afterAll(async () => { await browser?.close() })

describe('accounts in a real browser', () => {
  it('shows field errors from the shared schema, then signs up and founds a group', async () => {
    const page = await newPage(browser, inject('baseUrl'))
    await page.goto('/signup')
    await hydrated(page)
    await page.getByRole('button', { name: 'Create account' }).click()
    await expect.poll(() => page.getByText('Enter a valid e-mail address').count()).toBe(1)
    await expect.poll(() => page.getByText('Password must have at least 10 characters').count()).toBe(1)

    await page.getByLabel('Name', { exact: true }).fill('Browser Tester')
    await page.getByLabel('E-mail').fill(uniqueEmail('browser'))
    await page.getByLabel(/^Password/).fill('a long enough password')
    await page.getByRole('button', { name: 'Create account' }).click()
    await page.waitForURL('**/groups')
    await page.getByLabel('Group name').fill('Browser Group')
    await page.getByLabel('Short name (for links)').fill(`browser-${Date.now().toString(36)}`)
    await page.getByRole('button', { name: 'Create group' }).click()
    await page.waitForURL(/\/groups\/browser-/)
    await expect.poll(() => page.getByRole('heading', { name: 'Browser Group' }).count()).toBe(1)
    await screenshot(page, 'group-page')
  })

  it('sends a signed-out visitor to sign in', async () => {
    const page = await newPage(browser, inject('baseUrl'))
    await page.goto('/groups')
    await page.waitForURL(/\/signin\?next=/)
    expect(await page.getByRole('heading', { name: 'Sign in' }).count()).toBe(1)
  })
})
