import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest'
import type { Browser, BrowserContext, Page } from 'playwright-core'
import { launchBrowser, newPage, hydrated } from '../support/browser'
import { signedUpClient, TEST_PASSWORD } from '../support/client'
import { addBasis, SMALL_THEORY, type World } from '../support/fixtures'
import { forbiddenIn } from '../support/forbiddenMessages'

// Every form of the app, filled with bad input in Debian's Chromium: each message on screen
// is checked against the forbidden list (no code names, zod texts, "undefined", internal
// keys, stack traces, SQL), and the message the bad input calls for must appear.
let browser: Browser
let signedIn: BrowserContext
let owner: { email: string }
let slug: string
let theoryId: number
let basisId: number
let sextetId: number

const MESSAGES = '.error, [role="alert"], [role="status"], [data-test="input-error"], [data-test="problems"] li, .text-warn'

async function shown(page: Page): Promise<string[]> {
  const texts = await page.locator(MESSAGES).allInnerTexts()
  return texts.map((t) => t.trim()).filter(Boolean)
}

/** Wait until `expected` is on screen, then check every message shown against the list. */
async function expectReadable(page: Page, step: string, expected: RegExp) {
  const deadline = Date.now() + 20_000
  while (!(await shown(page)).some((m) => expected.test(m))) {
    if (Date.now() > deadline) throw new Error(`${step}: ${expected} is not on screen; shown: ${JSON.stringify(await shown(page))}`)
    await page.waitForTimeout(150)
  }
  for (const m of await shown(page)) expect(forbiddenIn(m), `${step}: "${m}"`).toEqual([])
}

async function open(path: string, context = signedIn): Promise<Page> {
  const page = await context.newPage()
  await page.goto(path)
  await hydrated(page)
  return page
}

/** Submit a form without the browser's own checks (min/max/type), as a script or an old browser would. */
async function forceSubmit(page: Page, button: string) {
  await page.getByRole('button', { name: button }).evaluate((b: HTMLButtonElement) => b.form!.dispatchEvent(new Event('submit', { cancelable: true })))
}

beforeAll(async () => {
  browser = await launchBrowser()
  const o = await signedUpClient('forms')
  owner = o
  slug = `forms-${Date.now().toString(36)}`
  expect((await o.client.post('/api/groups', { slug, name: 'Forms group' })).status).toBe(201)
  const t = await o.client.post(`/api/groups/${slug}/theories`, { definition: { ...SMALL_THEORY, name: 'Forms theory' } })
  theoryId = t.body.theory.id
  basisId = (await addBasis({ theoryId } as World)).basisId
  // A sextet scalar: counted, but its S6^4 S6* class is beyond the explicit-basis evaluation budget.
  const s = await o.client.post(`/api/groups/${slug}/theories`, {
    definition: { name: 'Sextet', frame: 'relativistic', groups: [{ name: 'C', type: 'SU', n: 3, gauge: true }], fields: [{ name: 'S6', lorentz: 'scalar', reps: { C: [2, 0] } }] },
  })
  sextetId = s.body.theory.id
  signedIn = await browser.newContext({ baseURL: inject('baseUrl'), viewport: { width: 1280, height: 900 } })
  expect((await signedIn.request.post('/api/auth/signin', { data: { email: owner.email, password: TEST_PASSWORD } })).status()).toBe(200)
})
afterAll(async () => {
  await browser?.close()
})

describe('every form, with bad input, shows only messages written for its user', () => {
  it('sign-up, sign-in, forgotten password, reset link and invitation link', async () => {
    const page = await newPage(browser, inject('baseUrl'))
    await page.goto('/signup')
    await hydrated(page)
    expect(await shown(page), 'an untouched form shows no message').toEqual([])
    await page.getByRole('button', { name: 'Create account' }).click()
    await expectReadable(page, 'empty sign-up', /^Password must have at least 10 characters$/)
    await page.getByLabel('Name', { exact: true }).fill('Forms Tester')
    await page.getByLabel('E-mail').fill(owner.email)
    await page.getByLabel(/^Password/).fill('a long enough password')
    await page.getByRole('button', { name: 'Create account' }).click()
    // A taken address answers as a new one does (no account discovery); its owner gets a notice.
    await expectReadable(page, 'sign-up with a taken address', /^Check your mailbox: a link to finish creating the account/)

    await page.goto('/signin')
    await hydrated(page)
    expect(await shown(page)).toEqual([])
    await page.getByRole('button', { name: 'Sign in' }).click()
    await expectReadable(page, 'empty sign-in', /Password is required|e-mail/i)
    await page.getByLabel('E-mail').fill(owner.email)
    await page.getByLabel('Password').fill('not the password')
    await page.getByRole('button', { name: 'Sign in' }).click()
    await expectReadable(page, 'wrong password', /^E-mail or password is wrong$/)

    await page.goto('/forgot')
    await hydrated(page)
    await page.getByLabel('E-mail of the account').fill('not an address')
    await page.getByRole('button', { name: 'Send a reset link' }).click()
    await expectReadable(page, 'reset request for a bad address', /^Enter a valid e-mail address$/)

    await page.goto('/reset/too-short')
    await hydrated(page)
    await page.getByLabel(/^New password/).fill('short')
    await page.getByRole('button', { name: 'Set password' }).click()
    await expectReadable(page, 'a short password', /^Password must have at least 10 characters$/)
    await page.goto(`/reset/${'x'.repeat(43)}`)
    await hydrated(page)
    await page.getByLabel(/^New password/).fill('a long enough password')
    await page.getByRole('button', { name: 'Set password' }).click()
    await expectReadable(page, 'an unknown reset link', /reset link is invalid, used or expired/)

    await page.goto(`/join/${'y'.repeat(43)}`)
    await expectReadable(page, 'an unknown invitation link', /invitation is invalid, used or expired/)
  })

  it('account: the current password and a new one', async () => {
    const page = await open('/account')
    await page.getByLabel('Current password').fill('not the password')
    await page.getByLabel(/^New password/).fill('short')
    await page.getByRole('button', { name: 'Change the password' }).click()
    await expectReadable(page, 'a short new password', /^Password must have at least 10 characters$/)
    await page.getByLabel(/^New password/).fill('a long enough password')
    await page.getByRole('button', { name: 'Change the password' }).click()
    await expectReadable(page, 'a wrong current password', /^The current password is wrong$/)
  })

  it('groups: found a group, invite, change roles', async () => {
    const page = await open('/groups')
    expect(await shown(page)).toEqual([])
    await page.getByLabel('Short name (for links)').fill('A!')
    await page.getByRole('button', { name: 'Create group' }).click()
    await expectReadable(page, 'a bad short name and no name', /^Short name: 3–48 lower-case letters/)
    await page.getByLabel('Group name').fill('Another')
    await page.getByLabel('Short name (for links)').fill(slug)
    await page.getByRole('button', { name: 'Create group' }).click()
    await expectReadable(page, 'a taken short name', /is taken/)

    const group = await open(`/groups/${slug}`)
    await group.getByLabel('E-mail to invite').fill('nobody at all')
    await group.getByRole('button', { name: 'Send invitation' }).click()
    await expectReadable(group, 'a bad address to invite', /^Enter a valid e-mail address$/)
    await group.getByLabel('Role of forms').selectOption('viewer')
    await expectReadable(group, 'the last owner steps down', /at least one owner/)
  })

  it('the theory editor: nothing before typing; then bad names, numbers, charges and files', async () => {
    const page = await open(`/groups/${slug}/new-theory`)
    await page.getByRole('button', { name: 'Use preset' }).waitFor()
    await page.waitForTimeout(800) // the live checks have had time to run
    expect(await shown(page), 'an untouched editor shows no message').toEqual([])
    await page.getByRole('button', { name: 'Add a symmetry' }).click()
    await page.getByRole('button', { name: 'Add a field' }).click()
    expect(await page.locator('[data-test="input-error"]').count(), 'new rows show no message before typing').toBe(0)
    await page.getByLabel('Kind of symmetry 1', { exact: true }).selectOption('SU')
    await page.getByLabel('n of symmetry 1', { exact: true }).fill('x')
    await expectReadable(page, 'n typed as a word', /^Must be a whole number \(the n of SU\(n\)\), not "x"$/)
    await page.getByLabel('Name of field 1', { exact: true }).fill('2H')
    await expectReadable(page, 'a field name starting with a digit', /^A name is a letter followed by up to 15 letters/)
    await page.getByLabel('Flavors of 2H', { exact: true }).fill('three')
    await expectReadable(page, 'flavors typed as a word', /^Must be a whole number from 1 to 6, not "three"$/)
    await page.getByRole('button', { name: 'Create theory' }).click()
    await expectReadable(page, 'the problems listed on save', /^Name must not be empty$/)
    expect((await page.locator('[data-test="problems"] li').allInnerTexts()).length).toBeGreaterThan(2)

    await page.locator('#theory-upload').setInputFiles({ name: 'broken.json', mimeType: 'application/json', buffer: Buffer.from('{ "name": ') })
    await expectReadable(page, 'a file that is not JSON', /^broken\.json is not valid JSON/)
    const shapes = { name: '', frame: 'flat', groups: [{ name: 'Y', type: 'U2', gauge: 'yes' }], fields: [{ name: 'phi', lorentz: 'Q', reps: { '1bad': [1] }, sneaky: 1 }] }
    await page.locator('#theory-upload').setInputFiles({ name: 'shapes.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(shapes)) })
    await expectReadable(page, 'a theory file of the wrong shape', /Field 1 "phi", representation under 1bad is not allowed here \(a name is a letter/)
    const rules = {
      name: 'x',
      frame: 'relativistic',
      groups: [
        { name: 'Y', type: 'U1', gauge: true, n: 3 },
        { name: 'G', type: 'SU', gauge: true },
      ],
      fields: [
        { name: 'phi', lorentz: 'scalar', real: true, charges: { Y: '1/3', Q: '1' }, reps: { G: [1] } },
        { name: 'D', lorentz: 'field-strength' },
      ],
    }
    await page.locator('#theory-upload').setInputFiles({ name: 'rules.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(rules)) })
    await expectReadable(page, 'a theory file breaking the rules', /Field 1 "phi", charge under Y: a real scalar must have zero U\(1\) charges/)
    // Loaded with its problems marked: every input shows its message at once.
    await page.getByRole('button', { name: 'Load it anyway and fix it here' }).click()
    await expectReadable(page, 'the broken file loaded', /^A real scalar must have zero U\(1\) charges, but this one is 1\/3$/)
    await expectReadable(page, 'the broken file loaded', /^Cannot be "D", the covariant derivative; choose another name$/)
  })

  it('runs: an empty dimension, and a run the engine refuses', async () => {
    const page = await open(`/theories/${theoryId}`)
    await page.getByLabel('Up to mass dimension').fill('')
    await forceSubmit(page, 'Start run')
    await expectReadable(page, 'an empty maximum dimension', /^Maximum dimension must be at least 5$/)
    const sextet = await open(`/theories/${sextetId}`)
    await sextet.getByLabel('Up to mass dimension').fill('6')
    await sextet.getByRole('button', { name: 'Start run' }).click()
    await expectReadable(sextet, 'a basis run with a sextet', /^class S6\^4 S6\*: writing it out needs about [\d.e+]+ index-loop terms .*; its count is given by the Hilbert series$/)
  })

  it('the board: a typed operator, tags, notes, an import and a precision target', async () => {
    const page = await open(`/bases/${basisId}`)
    await page.getByText('Rewrite a typed operator').click()
    await page.locator('input[name="rewriteText"]').fill('<12')
    await page.getByRole('button', { name: 'Rewrite' }).click()
    await expectReadable(page, 'an unreadable typed operator', /^Cannot read "<12" in "<12"/)
    await page.locator('input[name="rewriteText"]').fill('<12>[34] {g:7}')
    await page.getByRole('button', { name: 'Rewrite' }).click()
    await expectReadable(page, 'a typed operator of the wrong shape', /^(The term|The bracket|The gauge contraction)/)

    await page.locator('[data-operator] button').first().click()
    await page.getByLabel('Tag kind').selectOption('threshold')
    await page.getByRole('button', { name: 'Add tag' }).click()
    await expectReadable(page, 'a threshold tag without a field', /^Label is required: name the heavy field/)
    await page.getByRole('button', { name: 'Save note' }).click()
    await expectReadable(page, 'an empty note', /^Note is empty: write the note$/)

    const file = page.locator('input[name="importChoice"]')
    await file.setInputFiles({ name: 'x.json', mimeType: 'application/json', buffer: Buffer.from('not json') })
    await expectReadable(page, 'an import that is not JSON', /^This file is not JSON\.$/)
    await file.setInputFiles({ name: 'y.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify({ format: 'other', formatVersion: 2, orders: [{ order: 'two' }] })) })
    await expectReadable(page, 'an import of another format', /^File format must be "scalewright-basis"/)

    await page.getByText('Set aside the orders below a precision target').click()
    await page.locator('input[name="target"]').fill('2')
    await page.getByRole('button', { name: /^Set aside orders below/ }).click()
    await expectReadable(page, 'a precision target above 1', /^Precision target must be below 1$/)
  })

  it('scales: a ladder, α_s and α with bad numbers', async () => {
    const page = await open(`/theories/${theoryId}/scales`)
    await page.getByLabel('Scale 1 value').fill('ten')
    await page.getByRole('button', { name: 'Save ladder' }).click()
    await expectReadable(page, 'a scale written in words', /^Scale 1 "E", value: a number must be written like 0\.511/)
    await page.getByLabel('Scale 1 value').fill('10')
    await page.getByLabel('Parameter 1 denominator').fill('3')
    await page.getByLabel('Orders to estimate (comma-separated)').fill('1, x')
    await page.getByRole('button', { name: 'Save ladder' }).click()
    await expectReadable(page, 'an order written as a word', /^Order 2 must be a whole number from 0 to 40/)
    await page.getByLabel('Orders to estimate (comma-separated)').fill('1, 2')
    await page.getByRole('button', { name: 'Save ladder' }).click()
    await expectReadable(page, 'a ratio of a scale and a number', /^Expansion parameter "eps" mixes a scale with a plain number/)

    const couplings = await open(`/theories/${theoryId}/couplings`)
    await couplings.locator('input[name="alphaS"]').fill('0.5')
    await couplings.locator('input[name="muFrom"]').fill('2')
    await couplings.locator('input[name="muTo"]').fill('0.5')
    await couplings.getByRole('button', { name: 'Compute α_s' }).click()
    await expectReadable(couplings, 'α_s into its Landau pole', /^α_s grows beyond the perturbative range below μ = [\d.]+ GeV .*choose a higher scale/)
    await couplings.locator('input[name="muTo"]').fill('far away')
    await couplings.getByRole('button', { name: 'Compute α_s' }).click()
    await expectReadable(couplings, 'a scale written in words', /^Wanted scale μ must be a number of GeV$/)
    await couplings.locator('input[name="qedMuTo"]').fill('-1')
    await couplings.getByRole('button', { name: 'Compute α', exact: true }).click()
    await expectReadable(couplings, 'a negative scale for α', /^Wanted scale μ must be at least 0\.0001 GeV$/)
  })

  it('integrating out, and share links', async () => {
    const page = await open(`/theories/${theoryId}/integrate-out`)
    await page.getByRole('button', { name: 'Integrate out' }).click()
    await expectReadable(page, 'no field chosen', /^Choose at least one heavy field\.$/)
    await page.locator('input[name="field-phi"]').check()
    await page.locator('input[name="scaleName"]').fill('9bad')
    await page.getByRole('button', { name: 'Integrate out' }).click()
    await expectReadable(page, 'a scale name starting with a digit', /^Threshold scale, name: a scale name is a letter/)

    const theory = await open(`/theories/${theoryId}`)
    await theory.getByLabel('Expires after (days, empty = never)').fill('400')
    await forceSubmit(theory, 'New link')
    await expectReadable(theory, 'a link for 400 days', /^Days until the link expires must be at most 365$/)
  })
})

describe('an unknown address', () => {
  it('says what is missing, in words', async () => {
    const page = await open('/theories/999999')
    await expectReadable(page, 'a theory that does not exist', /^No theory with id 999999$/)
  })
})
