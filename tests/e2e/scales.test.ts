import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest'
import type { Browser, Page } from 'playwright-core'
import { launchBrowser, newPage, screenshot, hydrated } from '../support/browser'
import { signedUpClient, TEST_PASSWORD } from '../support/client'
import { addBasis, type World, DIRAC_AND_SCALAR } from '../support/fixtures'

// Scale ladder, tower and couplings pages in Debian's Chromium: edit a ladder and see its
// chart drawn, integrate a field out and land on the child with its threshold tag.
let browser: Browser
let theoryId: number
let email: string

const DEMO_LIKE = DIRAC_AND_SCALAR

/** True when the chart canvas has drawn pixels (not a blank canvas). */
async function canvasDrawn(page: Page, index = 0): Promise<boolean> {
  return page
    .locator('canvas[data-test="chart"]')
    .nth(index)
    .evaluate((c: HTMLCanvasElement) => {
      if (!c.width || !c.height) return false
      const d = c.getContext('2d')!.getImageData(0, 0, c.width, c.height).data
      let painted = 0
      for (let i = 3; i < d.length; i += 4) if (d[i]! > 0) painted++
      return painted > 500
    })
}

let signedIn: Page | undefined
/** A page of one signed-in browser context (signed in once, shared by the tests). */
async function signedInPage(): Promise<Page> {
  if (!signedIn) {
    signedIn = await newPage(browser, inject('baseUrl'))
    await signedIn.goto('/signin')
    await hydrated(signedIn)
    await signedIn.getByLabel('E-mail').fill(email)
    await signedIn.getByLabel('Password').fill(TEST_PASSWORD)
    await signedIn.getByRole('button', { name: 'Sign in' }).click()
    await signedIn.waitForURL('**/groups', { waitUntil: 'domcontentloaded', timeout: 60_000 })
  }
  return signedIn.context().newPage()
}

beforeAll(async () => {
  browser = await launchBrowser()
  const owner = await signedUpClient('scales')
  email = owner.email
  const slug = `scales-${Date.now().toString(36)}`
  expect((await owner.client.post('/api/groups', { slug, name: 'Scales group' })).status).toBe(201)
  const t = await owner.client.post(`/api/groups/${slug}/theories`, { definition: DEMO_LIKE })
  expect(t.status).toBe(201)
  theoryId = t.body.theory.id
  await addBasis({ theoryId } as World) // order 2: three kept operators, one set aside (rows written directly)
})
afterAll(async () => {
  await browser?.close()
})

describe('scales in a real browser', () => {
  it('edits a scale ladder, saves it and draws the size-per-order chart', async () => {
    const page = await signedInPage()
    await page.goto(`/theories/${theoryId}`)
    await hydrated(page)
    await page.getByRole('navigation', { name: 'Theory pages' }).getByRole('link', { name: 'Scale ladder' }).click()
    await page.waitForURL(`**/theories/${theoryId}/scales`)
    await page.getByLabel('Scale 2 value').fill('10')
    await page.getByLabel('Precision target').fill('1e-7')
    await page.getByLabel('Orders to estimate (comma-separated)').fill('0, 1, 2, 3, 4')
    await page.getByRole('button', { name: 'Add derived scale' }).click()
    await page.getByLabel('Derived scale 1 name').fill('Mhalf')
    await page.getByLabel('Derived scale 1 base scale').fill('M')
    await page.getByLabel('Derived scale 1 factor').fill('1/2')
    await page.getByLabel('Derived scale 1 unit').selectOption('GeV')
    await page.getByRole('button', { name: 'Save ladder' }).click()
    await expect.poll(() => page.getByText('Saved as version 1.').count()).toBe(1)
    // ε = 1 GeV / 10 TeV = 1/10000: order 2 is 1e-8, below the 1e-7 target (common practice, ε^n estimates).
    await expect.poll(() => page.locator('[data-test="orders-table"] tr.text-warn').count()).toBe(3)
    await expect.poll(() => canvasDrawn(page), { timeout: 10_000 }).toBe(true)
    await expect.poll(() => page.getByRole('cell', { name: '5000 GeV' }).count()).toBe(1) // M/2 = 5 TeV, shown in GeV
    await screenshot(page, 'scale-ladder')
    await page.getByRole('button', { name: 'Set aside orders below 1e-7' }).click()
    await expect.poll(() => page.getByText('Set aside 3 operators of order 2.').count()).toBe(1)
  })

  it('integrates the Dirac fermion out and lands on the child theory with its threshold tag', async () => {
    const page = await signedInPage()
    await page.goto(`/theories/${theoryId}/integrate-out`)
    await hydrated(page)
    await page.locator('input[name="field-eL"]').check()
    // The form ticks the other half of the Dirac fermion along and says why.
    await expect.poll(() => page.locator('input[name="field-eR"]').isChecked()).toBe(true)
    expect(await page.locator('[data-test="partner-note"]').textContent()).toContain('Also chose eR')
    await page.locator('input[name="scaleName"]').fill('me')
    await page.locator('input[name="scaleValue"]').fill('0.51099895')
    await page.locator('select[name="scaleUnit"]').selectOption('MeV')
    await page.getByRole('button', { name: 'Integrate out' }).click()
    await page.waitForURL(/\/theories\/\d+\/tower$/)
    const childId = Number(/theories\/(\d+)\/tower/.exec(page.url())![1])
    expect(childId).not.toBe(theoryId)
    const tags = page.locator(`[data-theory="${childId}"] [data-test="threshold-tags"]`)
    await expect.poll(() => tags.getByText('kinetic term of QED').count()).toBe(2)
    await expect.poll(() => page.locator(`[data-theory="${childId}"] [data-matching="euler-heisenberg"]`).count()).toBe(1)
    await screenshot(page, 'tower')
  })

  it('plots α_s and α against the scale with the caution shown', async () => {
    const page = await signedInPage()
    await page.goto(`/theories/${theoryId}/couplings`)
    await hydrated(page)
    await expect.poll(() => page.locator('[data-test="alphas-result"]').count(), { timeout: 15_000 }).toBe(1)
    await expect.poll(() => page.locator('[data-test="alpha-mz"]').count()).toBe(1)
    expect(await page.getByText('These are estimates and leading-order formulas; check against the literature for precision work').count()).toBe(1)
    for (const chart of [0, 1, 2]) await expect.poll(() => canvasDrawn(page, chart), { timeout: 10_000 }).toBe(true)
    await screenshot(page, 'couplings')
    await page.setViewportSize({ width: 820, height: 1100 })
    await screenshot(page, 'couplings-tablet')
  })

  it("runs the theory's own U(1) through the electron threshold of its tower, lists b exactly and names a Landau pole", async () => {
    const page = await signedInPage()
    await page.goto(`/theories/${theoryId}/couplings`)
    await hydrated(page)
    const panel = page.locator('section[aria-labelledby="gauge-title"]')
    await expect.poll(() => panel.locator('[data-test="gauge-table"]').count(), { timeout: 20_000 }).toBe(1)
    // Below the electron (0.511 MeV) nothing runs; above it b = (2/3)(1 + 1) = 4/3 for one Dirac fermion of charge −1 (Machacek & Vaughn 1983, by hand).
    await expect.poll(() => panel.locator('[data-test="gauge-segment"] [data-test="b"]').allTextContents()).toEqual(['0', '4/3'])
    expect(await panel.getByRole('cell', { name: 'threshold of eL, threshold of eR' }).count()).toBe(1)
    await expect.poll(() => canvasDrawn(page, 0), { timeout: 10_000 }).toBe(true)
    await panel.getByLabel('α of QED at μ₀').fill('0.9')
    await panel.getByRole('button', { name: 'Run the gauge couplings' }).click()
    await expect.poll(() => panel.locator('[data-test="gauge-stop"]').textContent(), { timeout: 20_000 }).toMatch(/^g_QED grows beyond 4π above μ ≈ .* GeV: perturbation theory fails there/)
    await screenshot(page, 'couplings-gauge')
    await panel.getByLabel('α of QED at μ₀').fill('20')
    await panel.getByRole('button', { name: 'Run the gauge couplings' }).click()
    await expect.poll(() => panel.getByRole('alert').first().textContent(), { timeout: 20_000 }).toContain('must be below 4π to be perturbative')
  })
})
