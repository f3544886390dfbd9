import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest'
import type { Browser, Page } from 'playwright-core'
import { readFileSync } from 'node:fs'
import { launchBrowser, newPage, screenshot, hydrated } from '../support/browser'
import { uniqueEmail } from '../support/client'
import { signUpInBrowser } from '../support/signUp'
import smeft from '../../shared/presets/smeft.json'

let browser: Browser
beforeAll(async () => {
  browser = await launchBrowser()
})
afterAll(async () => {
  await browser?.close()
})

async function signUpAndFoundGroup(page: Page, name: string) {
  await signUpInBrowser(page, name, uniqueEmail('editor-e2e'))
  const slug = `ed-${Date.now().toString(36)}`
  await page.getByLabel('Group name').fill(`${name}'s group`)
  await page.getByLabel('Short name (for links)').fill(slug)
  await page.getByRole('button', { name: 'Create group' }).click()
  await page.waitForURL(`**/groups/${slug}`)
  return slug
}

/** An element marked data-test="id" (the project's test hook). */
const byTest = (page: Page, id: string) => page.locator(`[data-test="${id}"]`)

/** The text of the message an input points at (aria-describedby), or '' when there is none. */
async function messageNextTo(page: Page, label: string) {
  const input = page.getByLabel(label, { exact: true })
  const id = await input.getAttribute('aria-describedby')
  const el = page.locator(`[id="${id}"]`)
  return (await el.count()) ? (await el.innerText()).trim() : ''
}

describe('the theory editor in a real browser', () => {
  it('builds SMEFT from the preset, warns about anomalies live, validates, saves, downloads and uploads', async () => {
    const page = await newPage(browser, inject('baseUrl'))
    const problems: string[] = []
    page.on('pageerror', (e) => problems.push(e.message))
    page.on('console', (m) => {
      if (m.type() === 'error' && !/status of 409/.test(m.text())) problems.push(m.text())
    })
    const slug = await signUpAndFoundGroup(page, 'Editor Tester')
    await page.getByRole('link', { name: 'New theory' }).click()
    await page.waitForURL(`**/groups/${slug}/new-theory`)
    await page.getByRole('button', { name: 'Use preset' }).waitFor()
    await page.locator('#preset').selectOption('smeft')
    await page.getByRole('button', { name: 'Use preset' }).click()

    // Hypercharges of the SM fermions cancel: Bouchiat, Iliopoulos, Meyer, Phys. Lett. B 38 (1972) 519.
    await expect.poll(() => byTest(page, 'anomaly-free').count(), { timeout: 15_000 }).toBe(1)
    await page.getByRole('button', { name: 'Remove e', exact: true }).click()
    const warning = byTest(page, 'anomaly-warning')
    await warning.waitFor({ timeout: 15_000 })
    // Without e (3 flavors, left-handed conjugate Y = +1) the Y^3 and gravity^2 Y sums are -3 (same source).
    expect(await warning.innerText()).toMatch(/hypercharge\^3\s+sum = -3/)
    expect(await warning.innerText()).toMatch(/gravity\^2 hypercharge\s+sum = -3/)
    await screenshot(page, 'theory-editor-anomaly')

    // Put e back: a new row, then moved up to where it was.
    await page.getByRole('button', { name: 'Add a field' }).click()
    await page.getByLabel('Name of field 9', { exact: true }).fill('e')
    await page.getByLabel('Lorentz kind of e', { exact: true }).selectOption('right-weyl')
    await page.getByLabel('Charge of e under hypercharge', { exact: true }).fill('-1')
    await page.getByLabel('Flavors of e', { exact: true }).fill('3')
    for (let i = 0; i < 4; i++) await page.getByRole('button', { name: 'Move e up', exact: true }).click()
    await expect.poll(() => byTest(page, 'anomaly-free').count(), { timeout: 15_000 }).toBe(1)

    // A bad charge: the schema's message appears next to that input.
    await page.getByLabel('Charge of H under hypercharge', { exact: true }).fill('1/2x')
    await expect.poll(() => messageNextTo(page, 'Charge of H under hypercharge')).toBe('A charge is a rational written "p/q" or an integer, e.g. "1/6"')
    expect(await page.getByLabel('Charge of H under hypercharge', { exact: true }).getAttribute('aria-invalid')).toBe('true')
    await screenshot(page, 'theory-editor-bad-charge')
    await page.getByLabel('Charge of H under hypercharge', { exact: true }).fill('1/2')
    await expect.poll(() => messageNextTo(page, 'Charge of H under hypercharge')).toBe('')

    await page.getByRole('button', { name: 'Create theory' }).click()
    await page.waitForURL(/\/theories\/\d+\/edit$/)
    const id = Number(/\/theories\/(\d+)\/edit/.exec(page.url())![1])
    const saved = await (await page.request.get(`/api/theories/${id}`)).json()
    expect(saved.theory.version).toBe(1)
    expect(saved.theory.definition).toEqual(smeft) // the preset, rebuilt field by field

    await page.reload()
    await hydrated(page)
    await expect
      .poll(
        () =>
          byTest(page, 'save-state')
            .innerText()
            .catch(() => ''),
        { timeout: 15_000 },
      )
      .toBe('Saved as version 1.')
    expect(await page.locator('#theory-name').inputValue()).toBe('SMEFT')

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download theory file' }).click()])
    expect(download.suggestedFilename()).toBe('SMEFT.json')
    expect(JSON.parse(readFileSync((await download.path())!, 'utf8'))).toEqual(saved.theory.definition)

    const upload = page.locator('#theory-upload')
    await upload.setInputFiles({ name: 'broken.json', mimeType: 'application/json', buffer: Buffer.from('{"name": "half a file", ') })
    await expect
      .poll(() =>
        byTest(page, 'upload-error')
          .innerText()
          .catch(() => ''),
      )
      .toMatch(/^broken\.json is not valid JSON/)
    const bad = { name: 'Bad', frame: 'relativistic', groups: [], fields: [{ name: 'phi', lorentz: 'field-strength' }] }
    await upload.setInputFiles({ name: 'bad.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(bad)) })
    await expect
      .poll(() =>
        byTest(page, 'upload-error')
          .innerText()
          .catch(() => ''),
      )
      .toContain('Field 1 "phi", gauge group of the field strength is required: choose the gauge group whose field strength this is')
    expect(await page.locator('#theory-name').inputValue()).toBe('SMEFT') // nothing replaced
    const oldLetters = { name: 'Old', frame: 'relativistic', groups: [], fields: [{ name: 'phi', lorentz: 'S', real: true }] }
    await upload.setInputFiles({ name: 'old.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(oldLetters)) })
    await expect
      .poll(() =>
        byTest(page, 'upload-error')
          .innerText()
          .catch(() => ''),
      )
      .toContain('"S" is the old one-letter spelling; write "scalar" (the other Lorentz kinds are "left-weyl", "right-weyl", "field-strength")')
    expect(await page.locator('#theory-name').inputValue()).toBe('SMEFT')
    await screenshot(page, 'theory-editor-upload-error')
    await page.setViewportSize({ width: 800, height: 1000 })
    await screenshot(page, 'theory-editor-tablet')
    await page.setViewportSize({ width: 1280, height: 900 })

    // A collaborator saves meanwhile: our save is refused with the server's message, then we reload.
    const other = await page.request.patch(`/api/theories/${id}`, { data: { definition: { ...smeft, description: 'changed elsewhere' }, version: 1 } })
    expect(other.status()).toBe(200)
    await page.locator('#theory-description').fill('my change')
    await page.getByRole('button', { name: 'Save theory' }).click()
    await expect
      .poll(() =>
        byTest(page, 'conflict')
          .innerText()
          .catch(() => ''),
      )
      .toContain('now version 2, you edited version 1')
    await page.getByRole('button', { name: 'Reload the saved version' }).click()
    await expect.poll(() => page.locator('#theory-description').inputValue()).toBe('changed elsewhere')
    expect(await byTest(page, 'save-state').innerText()).toBe('Saved as version 2.')
    await page.locator('#theory-description').fill('my change again')
    await page.getByRole('button', { name: 'Save theory' }).click()
    await expect.poll(() => byTest(page, 'save-state').innerText()).toBe('Saved as version 3.')

    // Symmetries and counting rules: a wrong number of Dynkin labels, a renamed group (the roster
    // follows it), a new counting rule with a bad weight, each message next to its input.
    await page.getByLabel('Dynkin labels of Q under colour', { exact: true }).fill('1')
    await expect.poll(() => messageNextTo(page, 'Dynkin labels of Q under colour')).toBe('SU(3) takes 2 Dynkin labels, but [1] has 1')
    await page.getByLabel('Dynkin labels of Q under colour', { exact: true }).fill('1,0')
    await page.getByLabel('Name of hypercharge', { exact: true }).fill('Hyper')
    expect(await page.getByLabel('Charge of H under Hyper', { exact: true }).inputValue()).toBe('1/2')
    await page.getByRole('button', { name: 'Add a counting rule' }).click()
    await page.locator('#rule-0-name').fill('momentum')
    await page.locator('#rule-0-kind').selectOption('momentumRatio')
    await page.getByRole('button', { name: 'Add a weight' }).click()
    await page.getByLabel('Building block 1 of momentum', { exact: true }).fill('D')
    await page.getByLabel('Weight of D in momentum', { exact: true }).fill('1/0')
    await expect.poll(() => messageNextTo(page, 'Weight of D in momentum')).toBe('A weight must be an exact rational written "p/q" or an integer, e.g. "3/2"')
    await page.getByLabel('Weight of D in momentum', { exact: true }).fill('1')
    await page.getByRole('button', { name: 'Save theory' }).click()
    await expect.poll(() => byTest(page, 'save-state').innerText()).toBe('Saved as version 4.')
    const last = (await (await page.request.get(`/api/theories/${id}`)).json()).theory.definition
    expect(last.countingRules).toEqual([{ name: 'momentum', kind: 'momentumRatio', weights: { D: '1' } }])
    expect(last.groups[2]).toEqual({ name: 'Hyper', type: 'U1', gauge: true })
    expect(last.fields.find((f: { name: string }) => f.name === 'B').gaugeOf).toBe('Hyper')
    expect(last.fields.find((f: { name: string }) => f.name === 'Q').charges).toEqual({ Hyper: '1/6' })
    await screenshot(page, 'theory-editor-saved')
    // Leaving with unsaved changes asks first; declining keeps the editor and the change.
    await page.locator('#theory-description').fill('unsaved words')
    const dialogs: string[] = []
    page.once('dialog', (d) => {
      dialogs.push(d.message())
      void d.dismiss()
    })
    await page.getByRole('link', { name: '← SMEFT' }).click()
    await expect.poll(() => dialogs).toEqual(['Leave the editor? Your unsaved changes will be lost.'])
    expect(page.url()).toMatch(/\/theories\/\d+\/edit$/)
    expect(await page.locator('#theory-description').inputValue()).toBe('unsaved words')
    expect(problems, 'no script errors or hydration mismatches in the browser').toEqual([])
  })

  it('edits the heavy particle of a heavy-frame theory in the form', async () => {
    const page = await newPage(browser, inject('baseUrl'))
    const problems: string[] = []
    page.on('pageerror', (e) => problems.push(e.message))
    const slug = await signUpAndFoundGroup(page, 'Heavy Tester')
    await page.goto(`/groups/${slug}/new-theory`)
    await hydrated(page)
    await page.locator('#preset').selectOption('heavy-vexonium')
    await page.getByRole('button', { name: 'Use preset' }).click()
    await expect.poll(() => page.getByLabel('Particle field', { exact: true }).inputValue()).toBe('psi')
    expect(await page.getByLabel('Antiparticle field', { exact: true }).inputValue()).toBe('chi')
    expect(await page.locator('#heavy-gauge option:checked').innerText()).toBe('Xd')
    expect(await page.getByLabel('Xd charge', { exact: true }).inputValue()).toBe('1')

    // A name the roster already uses is refused next to the input.
    await page.getByLabel('Particle field', { exact: true }).fill('Ad')
    await expect.poll(() => messageNextTo(page, 'Particle field')).toBe('This is already the name of a field of the roster; choose another name than "Ad"')
    await page.getByLabel('Particle field', { exact: true }).fill('vex')
    await page.getByLabel('Antiparticle field', { exact: true }).fill('')
    await page.getByLabel('Highest power of 1/m', { exact: true }).selectOption('2')
    await page.getByLabel('Xd charge', { exact: true }).fill('2')
    await screenshot(page, 'theory-editor-heavy')
    await page.getByRole('button', { name: 'Create theory' }).click()
    await page.waitForURL(/\/theories\/\d+\/edit$/)
    const id = Number(/\/theories\/(\d+)\/edit/.exec(page.url())![1])
    const saved = (await (await page.request.get(`/api/theories/${id}`)).json()).theory.definition
    expect(saved.heavy).toEqual({ particle: { name: 'vex', charges: { Xd: '2' }, description: 'vexon, two-component Pauli field' }, gaugeGroup: 'Xd', maxOrder: 2 })

    // Removing the block and declaring it again starts from "psi" on the gauge group.
    await hydrated(page)
    await page.getByRole('button', { name: 'Remove the heavy particle' }).click()
    await page.getByRole('button', { name: 'Declare the heavy particle' }).click()
    await page.getByRole('button', { name: 'Save theory' }).click()
    await expect.poll(() => byTest(page, 'save-state').innerText()).toBe('Saved as version 2.')
    const again = (await (await page.request.get(`/api/theories/${id}`)).json()).theory.definition
    expect(again.heavy).toEqual({ particle: { name: 'psi' }, gaugeGroup: 'Xd', maxOrder: 2 })
    expect(problems).toEqual([])
  })

  it('a heavy-frame theory: the overview lists the heavy particle, the run form speaks in orders of 1/m, the board states the antiparticle convention', async () => {
    const page = await newPage(browser, inject('baseUrl'))
    const problems: string[] = []
    page.on('pageerror', (e) => problems.push(e.message))
    const slug = await signUpAndFoundGroup(page, 'Heavy Runner')
    await page.goto(`/groups/${slug}/new-theory`)
    await hydrated(page)
    await page.locator('#preset').selectOption('heavy-vexonium')
    await page.getByRole('button', { name: 'Use preset' }).click()
    await expect.poll(() => page.getByLabel('Particle field', { exact: true }).inputValue()).toBe('psi')
    await page.getByRole('button', { name: 'Create theory' }).click()
    await page.waitForURL(/\/theories\/\d+\/edit$/)
    const id = Number(/\/theories\/(\d+)\/edit/.exec(page.url())![1])

    await page.goto(`/theories/${id}`)
    await hydrated(page)
    const summary = byTest(page, 'heavy-summary').first()
    expect(await summary.innerText()).toMatch(/psi\s+heavy particle/)
    expect(await summary.innerText()).toMatch(/chi\s+its antiparticle/)
    expect(await page.getByText('Up to mass dimension').count()).toBe(0)
    const order = page.getByLabel('Up to order')
    expect(await order.locator('option').allInnerTexts()).toEqual(['1/m', '1/m²', '1/m³', '1/m⁴'])
    await order.selectOption({ label: '1/m²' })
    await page.getByRole('button', { name: 'Start run' }).click()
    await expect.poll(() => byTest(page, 'run-reach').first().innerText()).toBe('to order 1/m²')
    await expect.poll(() => byTest(page, 'run-status').first().innerText(), { timeout: 90_000 }).toBe('finished')
    expect(await page.getByText('to dimension').count()).toBe(0)
    await screenshot(page, 'heavy-theory-runs')

    await page.getByRole('link', { name: 'Open basis board' }).first().click()
    await page.waitForURL(/\/bases\/\d+$/)
    await hydrated(page)
    // One convention for χ (Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125), stated on the board.
    expect(await byTest(page, 'basis-conventions').innerText()).toContain('Bodwin, Braaten, Lepage convention')
    expect(problems).toEqual([])
  })

  it('declares a Goldstone-frame theory in the form, runs its p⁴ basis and opens it on the board', async () => {
    const page = await newPage(browser, inject('baseUrl'))
    const problems: string[] = []
    page.on('pageerror', (e) => problems.push(e.message))
    const slug = await signUpAndFoundGroup(page, 'Goldstone Tester')
    await page.goto(`/groups/${slug}/new-theory`)
    await hydrated(page)
    await page.locator('#preset').selectOption('umbral-pions')
    await page.getByRole('button', { name: 'Use preset' }).click()
    await expect.poll(() => page.getByLabel('N', { exact: true }).inputValue()).toBe('3')
    await page.getByLabel('N', { exact: true }).fill('1')
    await expect.poll(() => messageNextTo(page, 'N')).toBe('Goldstone frame: N must be from 2 to 12 (or "general") for the chiral coset, but N = 1')
    await page.getByLabel('N', { exact: true }).fill('2')
    await page.getByLabel('Highest chiral order', { exact: true }).selectOption('4')
    await page.getByRole('button', { name: 'Create theory' }).click()
    await page.waitForURL(/\/theories\/\d+\/edit$/)
    const id = Number(/\/theories\/(\d+)\/edit/.exec(page.url())![1])
    const saved = (await (await page.request.get(`/api/theories/${id}`)).json()).theory.definition
    expect(saved.goldstone).toEqual({ coset: 'chiral', N: 2, sources: { scalar: true, vector: true }, maxOrder: 4, decayConstant: 'f_u', goldstoneName: 'pi_u' })

    await page.goto(`/theories/${id}`)
    await hydrated(page)
    await page.getByLabel('Up to chiral order').selectOption('4')
    await page.getByRole('button', { name: 'Start run' }).click()
    await page.getByRole('link', { name: 'Open basis board' }).waitFor({ timeout: 90_000 })
    // Gasser & Leutwyler, Ann. Phys. 158 (1984) 142: l1 … l7 and h1, h2, h3.
    expect(await byTest(page, 'goldstone-summary').first().innerText()).toBe('p^2: 2 · p^4: 10')
    await page.getByRole('link', { name: 'Open basis board' }).click()
    await page.waitForURL(/\/bases\/\d+$/)
    await hydrated(page)
    await page.locator('[data-column="4-kept"] [data-operator]').first().waitFor()
    expect(await page.locator('[data-column="4-kept"] [data-operator]').count()).toBe(10)
    expect(await page.locator('#order-4').innerText()).toContain('chiral order p4')
    await screenshot(page, 'board-goldstone')
    expect(problems).toEqual([])
  })
})
