import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest'
import type { Browser } from 'playwright-core'
import { launchBrowser, newPage, screenshot, hydrated } from '../support/browser'
import { uniqueEmail } from '../support/client'
import { signUpInBrowser } from '../support/signUp'

let browser: Browser
beforeAll(async () => {
  browser = await launchBrowser()
})
afterAll(async () => {
  await browser?.close()
})

describe('accounts in a real browser', () => {
  it('shows field errors from the shared schema, then signs up and founds a group', async () => {
    const page = await newPage(browser, inject('baseUrl'))
    await page.goto('/signup')
    await hydrated(page)
    await page.getByRole('button', { name: 'Create account' }).click()
    await expect.poll(() => page.getByText('Enter a valid e-mail address').count()).toBe(1)
    await expect.poll(() => page.getByText('Password must have at least 10 characters').count()).toBe(1)

    await signUpInBrowser(page, 'Browser Tester', uniqueEmail('browser'))
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

  it('changes the password on the account page, which signs out the other browsers', async () => {
    const base = inject('baseUrl')
    const email = uniqueEmail('account-e2e')
    const here = await newPage(browser, base)
    await signUpInBrowser(here, 'Account Tester', email, 'first long password')
    const laptop = await newPage(browser, base)
    expect((await laptop.request.post('/api/auth/signin', { data: { email, password: 'first long password' } })).status()).toBe(200)

    await here.goto('/groups')
    await hydrated(here)
    await here.getByRole('link', { name: 'Account of Account Tester' }).click()
    await here.waitForURL('**/account')
    await here.getByLabel('Current password').fill('not the password')
    await here.getByLabel(/^New password/).fill('second long password')
    await here.getByRole('button', { name: 'Change the password' }).click()
    await expect
      .poll(() =>
        here
          .getByRole('alert')
          .innerText()
          .catch(() => ''),
      )
      .toBe('The current password is wrong')
    await here.getByLabel('Current password').fill('first long password')
    await here.getByRole('button', { name: 'Change the password' }).click()
    await expect
      .poll(() =>
        here
          .getByRole('status')
          .innerText()
          .catch(() => ''),
      )
      .toBe('Password changed; you stay signed in here and are signed out everywhere else.')
    await screenshot(here, 'account-page')
    expect((await here.request.get('/api/auth/me')).status()).toBe(200)
    expect((await laptop.request.get('/api/auth/me')).status()).toBe(401)
  })
})
