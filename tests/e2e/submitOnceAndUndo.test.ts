import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest'
import type { Browser, Page } from 'playwright-core'
import { launchBrowser, newPage, screenshot, hydrated } from '../support/browser'
import { uniqueEmail } from '../support/client'
import { testDb } from '../support/db'
import { SMALL_THEORY } from '../support/fixtures'
import { signUpInBrowser } from '../support/signUp'

// Double submission and deletion in the browser: create buttons are disabled while their
// request runs (a second submit sends nothing), and deletions ask first and can be undone.
let browser: Browser
beforeAll(async () => {
  browser = await launchBrowser()
})
afterAll(async () => {
  await browser?.close()
})

const byTest = (page: Page, id: string) => page.locator(`[data-test="${id}"]`)
// Polls wait for the server's answer (held 1.5 s on purpose below) on a shared machine; vitest's default is 1 s.
const WAIT = { timeout: 15_000 }

async function signUpWithGroup(page: Page) {
  await signUpInBrowser(page, 'Undo Tester', uniqueEmail('undo-e2e'))
  const slug = `undo-${Date.now().toString(36)}`
  await page.getByLabel('Group name').fill('Undo group')
  await page.getByLabel('Short name (for links)').fill(slug)
  await page.getByRole('button', { name: 'Create group' }).click()
  await page.waitForURL(`**/groups/${slug}`)
  return slug
}

/** Hold every request to `pattern` for `ms` before it goes out: time to see the button pending. */
async function slowDown(page: Page, pattern: RegExp, ms: number) {
  await page.route(pattern, async (route) => {
    if (route.request().method() !== 'GET') await new Promise((r) => setTimeout(r, ms))
    await route.continue()
  })
}

describe('submitting once and undoing deletions', () => {
  it('run and note buttons are disabled while pending; notes, bases, theories and groups are deleted after a question and come back with undo', async () => {
    const page = await newPage(browser, inject('baseUrl'))
    const errors: string[] = []
    page.on('pageerror', (e) => errors.push(e.message))
    const slug = await signUpWithGroup(page)
    const theory = await page.evaluate(
      async ([s, definition]) => {
        const r = await fetch(`/api/groups/${s}/theories`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ definition }) })
        return (await r.json()).theory as { id: number }
      },
      [slug, { ...SMALL_THEORY, name: 'Undo theory' }] as const,
    )

    // Start run: pending → disabled; a second submit meanwhile starts nothing.
    await page.goto(`/theories/${theory.id}`)
    await hydrated(page)
    await slowDown(page, /\/api\/theories\/\d+\/runs$/, 1500)
    const start = page.getByRole('button', { name: 'Start run' })
    await start.click()
    await expect.poll(() => start.isDisabled(), WAIT).toBe(true)
    await start.evaluate((b) => (b as HTMLButtonElement).form!.requestSubmit())
    await page.getByRole('link', { name: 'Open basis board' }).waitFor({ timeout: 90_000 })
    expect(await testDb()('runs').where({ theory_id: theory.id }).count('* as n').first()).toEqual({ n: '1' })
    await page.unrouteAll()

    // A note: "Save note" pending → disabled, one note however often it is submitted.
    await page.getByRole('link', { name: 'Open basis board' }).click()
    await page.waitForURL(/\/bases\/\d+$/)
    await hydrated(page)
    await page.locator('[data-operator] button').first().click()
    await slowDown(page, /\/api\/theories\/\d+\/annotations$/, 1500)
    await page.getByLabel('Add a note').fill('Only once, please.')
    const save = page.getByRole('button', { name: 'Save note' })
    await save.click()
    await expect.poll(() => save.isDisabled(), WAIT).toBe(true)
    await save.evaluate((b) => (b as HTMLButtonElement).form!.requestSubmit())
    await expect.poll(() => page.getByText('Only once, please.').count(), WAIT).toBe(1)
    await expect.poll(() => save.isDisabled(), WAIT).toBe(false)
    expect(await testDb()('annotations').where({ theory_id: theory.id, body: 'Only once, please.' }).count('* as n').first()).toEqual({ n: '1' })
    await page.unrouteAll()

    // Delete the note: asked first, then gone, then back with undo.
    await page.getByRole('button', { name: 'Delete', exact: true }).click()
    await page.getByText('Delete this note?').waitFor()
    await screenshot(page, 'undo-note-question')
    await page.getByRole('button', { name: 'Delete', exact: true }).click()
    await expect.poll(() => page.getByText('Only once, please.').count(), WAIT).toBe(0)
    await expect.poll(() => byTest(page, 'undo-toast').innerText(), WAIT).toContain('Note deleted.')
    await screenshot(page, 'undo-note-toast')
    await byTest(page, 'undo-toast').getByRole('button', { name: 'Undo' }).click()
    await expect.poll(() => page.getByText('Only once, please.').count(), WAIT).toBe(1)

    // Delete the basis from the theory page, undo; then the theory, undo from its group's page.
    const basisId = Number(/bases\/(\d+)/.exec(page.url())![1])
    await page.goto(`/theories/${theory.id}`)
    await hydrated(page)
    const row = page.locator(`[data-basis="${basisId}"]`)
    await row.getByRole('button', { name: 'Delete' }).click()
    await row.getByRole('button', { name: 'Delete' }).click()
    await expect.poll(() => row.count(), WAIT).toBe(0)
    await byTest(page, 'undo-toast').getByRole('button', { name: 'Undo' }).click()
    await expect.poll(() => row.count(), WAIT).toBe(1)
    await byTest(page, 'theory-delete').getByRole('button', { name: 'Delete theory' }).click()
    await byTest(page, 'theory-delete').getByRole('button', { name: 'Delete', exact: true }).click()
    await page.waitForURL(`**/groups/${slug}`)
    await hydrated(page)
    expect(await page.getByRole('link', { name: 'Undo theory' }).count()).toBe(0)
    await byTest(page, 'undo-toast').getByRole('button', { name: 'Undo' }).click()
    await page.waitForURL(`**/theories/${theory.id}`)
    await expect.poll(() => page.locator('h1').innerText(), WAIT).toBe('Undo theory')

    // Delete the group: it leaves the list of groups; undo brings it back.
    await page.goto(`/groups/${slug}`)
    await hydrated(page)
    await byTest(page, 'group-delete').getByRole('button', { name: 'Delete group' }).click()
    await byTest(page, 'group-delete').getByRole('button', { name: 'Delete', exact: true }).click()
    await page.waitForURL(/\/groups$/)
    await expect.poll(() => page.getByRole('link', { name: 'Undo group' }).count(), WAIT).toBe(0)
    await screenshot(page, 'undo-group-toast')
    await byTest(page, 'undo-toast').getByRole('button', { name: 'Undo' }).click()
    await page.waitForURL(`**/groups/${slug}`)
    await expect.poll(() => page.locator('h1').innerText(), WAIT).toBe('Undo group')
    expect(errors).toEqual([])
  })
})
