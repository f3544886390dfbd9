import type { Page } from 'playwright-core'
import { hydrated } from './browser'
import { mailedToken } from './client'

/**
 * Sign up in the browser as a person does: fill the form, open the link mailed to the address
 * (read from the outbox that stands in for SMTP), and finish; ends signed in on /groups.
 */
export async function signUpInBrowser(page: Page, name: string, email: string, password = 'a long enough password') {
  await page.goto('/signup')
  await hydrated(page)
  await page.getByLabel('Name', { exact: true }).fill(name)
  await page.getByLabel('E-mail').fill(email)
  await page.getByLabel(/^Password/).fill(password)
  await page.getByRole('button', { name: 'Create account' }).click()
  await page.locator('[data-test="signup-mailed"]').waitFor()
  await page.goto(`/welcome/${await mailedToken(email, 'welcome')}`)
  await hydrated(page)
  await page.getByRole('button', { name: 'Create the account' }).click()
  await page.waitForURL('**/groups')
}
