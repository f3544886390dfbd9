import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest'
import type { Browser, Page } from 'playwright-core'
import { readFileSync } from 'node:fs'
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

const byTest = (page: Page, id: string) => page.locator(`[data-test="${id}"]`)

async function signUpWithGroup(page: Page) {
  await signUpInBrowser(page, 'Board Tester', uniqueEmail('board-e2e'))
  const slug = `board-${Date.now().toString(36)}`
  await page.getByLabel('Group name').fill('Board group')
  await page.getByLabel('Short name (for links)').fill(slug)
  await page.getByRole('button', { name: 'Create group' }).click()
  await page.waitForURL(`**/groups/${slug}`)
  return slug
}

describe('the basis board in a real browser', () => {
  it('from the SMEFT preset to a shared, exported basis', async () => {
    const page = await newPage(browser, inject('baseUrl'))
    const errors: string[] = []
    page.on('pageerror', (e) => errors.push(e.message))
    const slug = await signUpWithGroup(page)

    // A theory from the SMEFT preset.
    await page.getByRole('link', { name: 'New theory' }).click()
    await page.waitForURL(`**/groups/${slug}/new-theory`)
    await page.getByRole('button', { name: 'Use preset' }).waitFor()
    await page.locator('#preset').selectOption('smeft')
    await page.getByRole('button', { name: 'Use preset' }).click()
    await page.getByRole('button', { name: 'Create theory' }).click()
    await page.waitForURL(/\/theories\/\d+\/edit$/)
    const theoryId = Number(/theories\/(\d+)/.exec(page.url())![1])

    // Run dimension 6 (one flavor) and watch the progress bar finish.
    await page.goto(`/theories/${theoryId}`)
    await hydrated(page)
    await page.getByLabel('Up to mass dimension').fill('6')
    await page.getByLabel('Flavors').fill('1')
    await page.getByRole('button', { name: 'Start run' }).click()
    await byTest(page, 'run-progress').first().waitFor({ timeout: 15_000 })
    await screenshot(page, 'board-run-progress')
    await page.getByRole('link', { name: 'Open basis board' }).waitFor({ timeout: 90_000 })
    // Henning, Lu, Melia, Murayama, JHEP 08 (2017) 016: 2 and 84 real parameters at dimensions 5 and 6.
    expect(await page.locator('li[data-run]').first().innerText()).toContain('dimension 5: 2 · dimension 6: 84')
    await page.getByRole('link', { name: 'Open basis board' }).click()
    await page.waitForURL(/\/bases\/\d+$/)
    await hydrated(page)
    const basisUrl = page.url()

    // Order 1 is the Weinberg class (Weinberg, Phys. Rev. Lett. 43 (1979) 1566): one kept operator,
    // redundant alternatives set aside. Swap them: the kept one out (keyboard), an alternative in (drag).
    const kept = page.locator('[data-column="1-kept"] [data-operator]')
    const aside = page.locator('[data-column="1-set_aside"] [data-operator]')
    await kept.first().waitFor()
    expect(await kept.count()).toBe(1)
    const keptId = await kept.first().getAttribute('data-operator')
    await kept.first().getByRole('button', { name: 'Set aside' }).click()
    await expect.poll(() => page.locator('[data-class="L^2 H^2"] [data-test="coverage"]').innerText()).toBe('0 / 1')
    const candidate = aside.filter({ hasNot: page.locator(`[data-operator="${keptId}"]`) }).first()
    const candidateId = await candidate.getAttribute('data-operator')
    await candidate.dragTo(page.locator('[data-column="1-kept"] .min-h-12'))
    await expect.poll(() => page.locator('[data-column="1-kept"] [data-operator]').first().getAttribute('data-operator')).toBe(candidateId)
    await expect.poll(() => page.locator('[data-class="L^2 H^2"] [data-test="coverage"]').innerText()).toBe('1 / 1')
    // The operator now set aside rewrites exactly onto the new kept one.
    await page.locator(`[data-operator="${keptId}"] button`).first().click()
    await expect.poll(() => byTest(page, 'rewrite').innerText(), { timeout: 15_000 }).toMatch(/=/)
    expect(await byTest(page, 'rewrite').innerText()).not.toMatch(/Independent/)
    await screenshot(page, 'board-rewrite')

    // A threshold tag and a note on that operator.
    await page.getByLabel('Tag kind').selectOption('threshold')
    await page.getByLabel('Heavy field').fill('N')
    await page.getByRole('button', { name: 'Add tag' }).click()
    await expect.poll(() => page.locator(`[data-operator="${keptId}"]`).innerText()).toContain('coefficient shifts when N is integrated out')
    await page.getByLabel('Add a note').fill('Generated at tree level by a heavy singlet fermion.')
    await page.getByRole('button', { name: 'Save note' }).click()
    await expect.poll(() => page.getByText('Generated at tree level by a heavy singlet fermion.').count()).toBe(1)
    await screenshot(page, 'board-tagged')

    // Export LaTeX.
    const [download] = await Promise.all([page.waitForEvent('download'), byTest(page, 'export-latex').click()])
    const tex = readFileSync((await download.path())!, 'utf8')
    expect(tex).toContain('\\begin{longtable}')
    expect(tex).toContain('L^{2}\\,\\allowbreak H^{2}') // the Weinberg class (a line may break between its factors), with the operator now kept
    const csv = await (await page.request.get(`${basisUrl.replace('/bases/', '/api/bases/')}/export?format=csv`)).text()
    expect(csv).toContain('coefficient shifts when N is integrated out')

    // A share link, opened signed out: the board and the note show, nothing can be changed.
    await page.goto(`/theories/${theoryId}`)
    await hydrated(page)
    await page.getByRole('button', { name: 'New link' }).click()
    const shareUrl = (await byTest(page, 'share-url').locator('a').getAttribute('href'))!
    const visitor = await newPage(browser, inject('baseUrl'))
    await visitor.goto(shareUrl)
    await hydrated(visitor)
    expect(await byTest(visitor, 'read-only-banner').count()).toBe(1)
    expect(await visitor.getByRole('button', { name: 'Set aside' }).count()).toBe(0)
    expect(await visitor.getByRole('button', { name: 'Keep' }).count()).toBe(0)
    await visitor.locator(`[data-operator="${keptId}"] button`).first().click()
    expect(await visitor.getByText('Generated at tree level by a heavy singlet fermion.').count()).toBe(1)
    expect(await visitor.getByRole('button', { name: 'Add tag' }).count()).toBe(0)
    expect(await visitor.getByLabel('Add a note').count()).toBe(0)
    const attempt = await visitor.evaluate(
      async (id) =>
        (await fetch(`/api/operators/${id}/move`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ column: 'kept', position: 0, version: 1 }) })).status,
      keptId,
    )
    expect(attempt).toBe(401)
    await screenshot(visitor, 'board-shared-read-only')
    expect(basisUrl).toMatch(/\/bases\//)
    expect(errors).toEqual([])
  })
})
