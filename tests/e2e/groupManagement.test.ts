import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest'
import type { Browser } from 'playwright-core'
import { launchBrowser, newPage, screenshot, hydrated } from '../support/browser'
import { uniqueEmail, signedUpClient } from '../support/client'
import { signUpInBrowser } from '../support/signUp'
import { testDb } from '../support/db'

let browser: Browser
beforeAll(async () => {
  browser = await launchBrowser()
})
afterAll(async () => {
  await browser?.close()
})

/** The invitation token of the last mail to `email` (the outbox stands in for SMTP in tests). */
async function invitationToken(email: string): Promise<string> {
  const row = await testDb()('outbox').where({ to_address: email }).orderBy('id', 'desc').first('text_body')
  return /\/join\/([A-Za-z0-9_-]+)/.exec(row.text_body)![1]!
}

describe('group management in a real browser', () => {
  it('an owner invites by e-mail, the invitee joins through the link, the owner changes the role and withdraws another invitation', async () => {
    const owner = await newPage(browser, inject('baseUrl'))
    await signUpInBrowser(owner, 'Owner Tester', uniqueEmail('owner-e2e'))
    const slug = `gm-${Date.now().toString(36)}`
    await owner.getByLabel('Group name').fill('Management Group')
    await owner.getByLabel('Short name (for links)').fill(slug)
    await owner.getByRole('button', { name: 'Create group' }).click()
    await owner.waitForURL(`**/groups/${slug}`)
    await hydrated(owner)

    const invitee = uniqueEmail('invitee-e2e')
    await owner.getByLabel('E-mail to invite').fill('not an address')
    await owner.getByRole('button', { name: 'Send invitation' }).click()
    await expect.poll(() => owner.getByText('Enter a valid e-mail address', { exact: true }).count()).toBe(1)
    await owner.getByLabel('E-mail to invite').fill(invitee)
    await owner.locator('#invite-role').selectOption('editor')
    await owner.getByRole('button', { name: 'Send invitation' }).click()
    await expect.poll(() => owner.locator('[data-test="invitations"]').innerText()).toContain(invitee)

    // The invitee opens the link signed out, sees what it offers, and signs up with that address.
    const guest = await newPage(browser, inject('baseUrl'))
    await guest.goto(`/join/${await invitationToken(invitee)}`)
    await hydrated(guest)
    await expect.poll(() => guest.locator('main').innerText()).toContain('You are invited to Management Group as editor')
    await screenshot(guest, 'join-invitation')
    await guest.getByRole('link', { name: `Create an account with ${invitee}` }).click()
    await guest.waitForURL(/\/signup\?invitation=/)
    expect(await guest.getByLabel('E-mail').inputValue()).toBe(invitee)
    await guest.getByLabel('Name', { exact: true }).fill('Invited Tester')
    await guest.getByLabel(/^Password/).fill('a long enough password')
    await guest.getByRole('button', { name: 'Create account' }).click()
    await guest.waitForURL('**/groups')
    await expect.poll(() => guest.getByRole('link', { name: 'Management Group' }).count()).toBe(1)

    // The owner sees the new member and makes them a viewer.
    await owner.reload()
    await hydrated(owner)
    const roleSelect = owner.getByLabel('Role of Invited Tester')
    expect(await roleSelect.inputValue()).toBe('editor')
    await roleSelect.selectOption('viewer')
    await expect.poll(() => owner.getByText('Invited Tester is now viewer.').count()).toBe(1)
    const members = await testDb()('memberships as m').join('users as u', 'u.id', 'm.user_id').where('u.email', invitee).select('m.role')
    expect(members).toEqual([{ role: 'viewer' }])

    // The last owner cannot demote themself: the server's message is shown and the select reverts.
    await owner.getByLabel('Role of Owner Tester').selectOption('editor')
    await expect.poll(() => owner.getByText('A group needs at least one owner; make someone else owner first').count()).toBe(1)
    await expect.poll(() => owner.getByLabel('Role of Owner Tester').inputValue()).toBe('owner')

    // Withdraw an invitation that was never used.
    const other = uniqueEmail('withdrawn-e2e')
    await owner.getByLabel('E-mail to invite').fill(other)
    await owner.getByRole('button', { name: 'Send invitation' }).click()
    await owner.getByRole('button', { name: `Withdraw the invitation to ${other}` }).click()
    await expect.poll(() => owner.getByText(`Invitation to ${other} withdrawn.`).count()).toBe(1)
    await expect.poll(() => owner.locator('[data-test="invitations"]').innerText()).not.toContain(other)
    await screenshot(owner, 'group-management')

    // The invitee (now a viewer) leaves the group.
    await guest.goto(`/groups/${slug}`)
    await hydrated(guest)
    expect(await guest.getByLabel('Role of Owner Tester').count()).toBe(0) // only owners see role selects
    await guest.getByRole('button', { name: 'Leave group' }).click()
    await guest.getByRole('button', { name: 'Leave', exact: true }).click()
    await guest.waitForURL('**/groups')
    await expect.poll(() => guest.getByRole('link', { name: 'Management Group' }).count()).toBe(0)
  })

  it('a signed-in account joins with one click when the address matches, and is told when it does not', async () => {
    const owner = await signedUpClient('owner-api')
    const slug = `gj-${Date.now().toString(36)}`
    expect((await owner.client.post('/api/groups', { slug, name: 'Joining Group' })).status).toBe(201)
    const email = uniqueEmail('joiner-e2e')
    expect((await owner.client.post(`/api/groups/${slug}/invitations`, { email, role: 'commenter' })).status).toBe(201)
    const token = await invitationToken(email)

    const other = await newPage(browser, inject('baseUrl'))
    await signUpInBrowser(other, 'Someone Else', uniqueEmail('other-e2e'))
    await other.goto(`/join/${token}`)
    await hydrated(other)
    await expect.poll(() => other.locator('main').innerText()).toContain(`but this invitation is for ${email}`)
    expect(await other.getByRole('button', { name: 'Join' }).count()).toBe(0)

    const page = await newPage(browser, inject('baseUrl'))
    await signUpInBrowser(page, 'Joiner', email)
    await page.goto(`/join/${token}`)
    await hydrated(page)
    await page.getByRole('button', { name: 'Join' }).click()
    await page.waitForURL(`**/groups/${slug}`)
    await expect.poll(() => page.locator('main').innerText()).toContain('Your role: commenter')
    expect(await page.getByRole('link', { name: 'New theory' }).count()).toBe(0) // commenters declare no theory

    await page.goto(`/join/${token}`) // used once: the link is spent
    await hydrated(page)
    await expect.poll(() => page.locator('main').innerText()).toContain('This invitation is invalid, used or expired')
  })
})
