import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, addBasis, SMALL_THEORY, type World } from '../support/fixtures'
import { ApiClient, mailedToken, messageOf } from '../support/client'
import { testDb } from '../support/db'

// Deleting notes, tags, share links, bases, theories and groups: the deleted rows leave every
// read (lists, pages, boards, exports, share links), and undo brings them back unchanged. Who
// may delete what is checked route by route in roles.test.ts (routeCases.ts).
let world: World
let basis: Awaited<ReturnType<typeof addBasis>>
let shareToken: string
beforeAll(async () => {
  world = await buildWorld()
  basis = await addBasis(world)
  shareToken = (await world.owner.client.post(`/api/theories/${world.theoryId}/share-links`, {})).body.link.token
})

const viewer = () => world.byRole.viewer.client
async function boardNotes() {
  return (await viewer().get(`/api/bases/${basis.basisId}`)).body.notes.map((n: { body: string }) => n.body)
}

describe('notes and tags', () => {
  it('a note deleted by its author leaves the board, the list and the export; undo brings it back', async () => {
    const c = world.byRole.commenter.client
    const note = (await c.post(`/api/theories/${world.theoryId}/annotations`, { body: 'soon gone', operatorId: basis.operatorIds.photon })).body.annotation
    const del = await c.delete(`/api/annotations/${note.id}`)
    expect(del.body).toEqual({ deleted: note.id, undo: `/api/annotations/${note.id}/restore` })
    expect(await boardNotes()).not.toContain('soon gone')
    expect((await viewer().get(`/api/theories/${world.theoryId}/annotations`)).body.annotations.map((n: any) => n.id)).not.toContain(note.id)
    expect(JSON.stringify((await viewer().get(`/api/bases/${basis.basisId}/export?format=json`)).body)).not.toContain('soon gone')
    expect((await viewer().get(`/api/annotations/${note.id}/revisions`)).status).toBe(404)
    expect((await c.patch(`/api/annotations/${note.id}`, { body: 'edit a deleted note' })).status).toBe(404)
    expect((await c.post(del.body.undo)).status).toBe(200)
    expect(await boardNotes()).toContain('soon gone')
  })

  it("an editor may delete another member's note, a commenter may not", async () => {
    const note = (await world.owner.client.post(`/api/theories/${world.theoryId}/annotations`, { body: "the owner's note" })).body.annotation
    const refused = await world.byRole.commenter.client.delete(`/api/annotations/${note.id}`)
    expect(refused.status).toBe(403)
    expect(messageOf(refused)).toBe('Only the author or an editor may delete this note')
    expect((await world.byRole.editor.client.delete(`/api/annotations/${note.id}`)).status).toBe(200)
    expect((await world.byRole.commenter.client.post(`/api/annotations/${note.id}/restore`)).status).toBe(403)
    expect((await world.byRole.editor.client.post(`/api/annotations/${note.id}/restore`)).status).toBe(200)
  })

  it('a removed tag leaves the board; adding it again brings back the same tag, not a second one', async () => {
    const c = world.byRole.commenter.client
    const tag = (await c.post(`/api/operators/${basis.operatorIds.sextic}/tags`, { kind: 'cp-odd' })).body.tag
    expect((await c.delete(`/api/tags/${tag.id}`)).status).toBe(200)
    expect((await viewer().get(`/api/bases/${basis.basisId}`)).body.tags.map((t: any) => t.id)).not.toContain(tag.id)
    const again = await c.post(`/api/operators/${basis.operatorIds.sextic}/tags`, { kind: 'cp-odd' })
    expect(again.status).toBe(201)
    expect(again.body.tag.id).toBe(tag.id)
    expect(await testDb()('tags').where({ operator_id: basis.operatorIds.sextic, kind: 'cp-odd' }).count('* as n').first()).toEqual({ n: '1' })
  })
})

describe('share links, bases, theories and groups', () => {
  it('a revoked share link works again after undo', async () => {
    const link = (await world.owner.client.post(`/api/theories/${world.theoryId}/share-links`, {})).body.link
    const del = await world.owner.client.delete(`/api/share-links/${link.id}`)
    expect((await new ApiClient().get(`/api/share/${link.token}`)).status).toBe(404)
    expect((await world.owner.client.post(del.body.undo)).status).toBe(200)
    expect((await new ApiClient().get(`/api/share/${link.token}`)).status).toBe(200)
  })

  it('a deleted basis leaves the list, its board and its share link (the link shows the newest basis left); undo restores it', async () => {
    const newer = await addBasis(world)
    const shared = async () => (await new ApiClient().get(`/api/share/${shareToken}`)).body.board?.basis.id
    expect(await shared()).toBe(newer.basisId)
    expect((await world.byRole.editor.client.delete(`/api/bases/${newer.basisId}`)).status).toBe(403)
    const del = await world.owner.client.delete(`/api/bases/${newer.basisId}`)
    expect(del.status).toBe(200)
    expect((await viewer().get(`/api/theories/${world.theoryId}/bases`)).body.bases.map((b: any) => b.id)).not.toContain(newer.basisId)
    for (const path of [`/api/bases/${newer.basisId}`, `/api/bases/${newer.basisId}/export?format=json`, `/api/operators/${newer.operatorIds.photon}/rewrite`]) {
      expect((await viewer().get(path)).status, path).toBe(404)
    }
    expect((await world.owner.client.post(`/api/operators/${newer.operatorIds.photon}/move`, { column: 'set_aside', position: 0, version: 1 })).status).toBe(404)
    expect(await shared()).not.toBe(newer.basisId)
    expect((await world.owner.client.post(del.body.undo)).status).toBe(200)
    expect(await shared()).toBe(newer.basisId)
    expect((await viewer().get(`/api/bases/${newer.basisId}`)).status).toBe(200)
  })

  it('a deleted theory leaves the group page, with its bases, notes and share links; its name is free; undo refuses while the name is taken', async () => {
    const t = (await world.owner.client.post(`/api/groups/${world.slug}/theories`, { definition: { ...SMALL_THEORY, name: 'Short-lived' } })).body.theory
    const link = (await world.owner.client.post(`/api/theories/${t.id}/share-links`, {})).body.link
    const del = await world.owner.client.delete(`/api/theories/${t.id}`)
    expect(del.status).toBe(200)
    const names = async () => (await viewer().get(`/api/groups/${world.slug}`)).body.theories.map((x: any) => x.name)
    expect(await names()).not.toContain('Short-lived')
    for (const path of [`/api/theories/${t.id}`, `/api/theories/${t.id}/annotations`, `/api/theories/${t.id}/bases`, `/api/share/${link.token}`]) {
      expect((await viewer().get(path)).status, path).toBe(404)
    }
    const twin = await world.owner.client.post(`/api/groups/${world.slug}/theories`, { definition: { ...SMALL_THEORY, name: 'Short-lived' } })
    expect(twin.status).toBe(201)
    const clash = await world.owner.client.post(del.body.undo)
    expect(clash.status).toBe(409)
    expect(messageOf(clash)).toMatch(/now has this theory's name/)
    expect((await world.owner.client.delete(`/api/theories/${twin.body.theory.id}`)).status).toBe(200)
    expect((await world.owner.client.post(del.body.undo)).status).toBe(200)
    expect(await names()).toContain('Short-lived')
    expect((await new ApiClient().get(`/api/share/${link.token}`)).status).toBe(200)
  })

  it('a deleted group is gone for every member until an owner undoes it; its short name stays taken', async () => {
    const slug = `gone-${Date.now().toString(36)}`
    expect((await world.owner.client.post('/api/groups', { slug, name: 'Gone for a while' })).status).toBe(201)
    // Adding a member is an invitation the person accepts.
    expect((await world.owner.client.post(`/api/groups/${slug}/members`, { email: world.byRole.editor.email, role: 'editor' })).status).toBe(201)
    const accepted = await world.byRole.editor.client.post('/api/invitations/accept', { token: await mailedToken(world.byRole.editor.email, 'join') })
    expect(accepted.status, JSON.stringify(accepted.body)).toBe(200)
    const t = (await world.owner.client.post(`/api/groups/${slug}/theories`, { definition: { ...SMALL_THEORY, name: 'Inside' } })).body.theory
    expect((await world.byRole.editor.client.delete(`/api/groups/${slug}`)).status).toBe(403)
    const del = await world.owner.client.delete(`/api/groups/${slug}`)
    expect(del.status).toBe(200)
    const mine = async (c: ApiClient) => (await c.get('/api/groups')).body.groups.map((g: any) => g.slug)
    expect(await mine(world.owner.client)).not.toContain(slug)
    expect(await mine(world.byRole.editor.client)).not.toContain(slug)
    for (const path of [`/api/groups/${slug}`, `/api/theories/${t.id}`]) expect((await world.byRole.editor.client.get(path)).status, path).toBe(404)
    const taken = await world.stranger.client.post('/api/groups', { slug, name: 'Squatter' })
    expect(taken.status).toBe(409)
    expect(messageOf(taken)).toMatch(/taken by a deleted group/)
    expect((await world.byRole.editor.client.post(`/api/groups/${slug}/restore`)).status).toBe(403)
    expect((await world.owner.client.post(del.body.undo)).status).toBe(200)
    expect(await mine(world.byRole.editor.client)).toContain(slug)
    expect((await world.byRole.editor.client.get(`/api/theories/${t.id}`)).status).toBe(200)
  })
})
