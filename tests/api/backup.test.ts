import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest'
import { spawnSync } from 'node:child_process'
import { mkdtempSync, rmSync, existsSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join, resolve } from 'node:path'
import knexFactory, { type Knex } from 'knex'
import { buildWorld, addBasis } from '../support/fixtures'
import { databaseState, publicTables } from '../support/dbSnapshot'

// npm run backup / npm run restore, run as the scripts themselves against the test cluster.
const root = resolve(import.meta.dirname, '..', '..')
const COPY = 'scalewright_test_backup_copy'
const TARGET = 'scalewright_test_backup_target'
let admin: Knex
let dir: string
const urlOf = (db: string) => inject('databaseUrl').replace(/\/[^/]*$/, `/${db}`)

function script(name: 'backup' | 'restore', databaseUrl: string, file: string) {
  const r = spawnSync(process.execPath, [join(root, 'scripts', `${name}.mjs`), file], { cwd: root, encoding: 'utf8', env: { ...process.env, DATABASE_URL: databaseUrl } })
  return { status: r.status, out: `${r.stdout}${r.stderr}` }
}

async function dropScratch() {
  const { rows } = await admin.raw(`SELECT datname FROM pg_database WHERE datname LIKE 'scalewright_test_backup_%'`)
  for (const { datname } of rows as { datname: string }[]) await admin.raw('DROP DATABASE IF EXISTS ?? WITH (FORCE)', [datname])
}

beforeAll(async () => {
  admin = knexFactory({ client: 'pg', connection: urlOf('postgres'), pool: { min: 0, max: 1 } })
  await dropScratch()
  dir = mkdtempSync(join(tmpdir(), 'sw-backup-'))
  // Rows in every kind of table the board uses: a group with members, a theory, a stored basis
  // with its operators, a note, a tag and a share link.
  const world = await buildWorld()
  const { operatorIds } = await addBasis(world)
  expect((await world.byRole.commenter.client.post(`/api/theories/${world.theoryId}/annotations`, { body: 'kept for the backup test', operatorId: operatorIds.sextic })).status).toBe(201)
  expect((await world.byRole.commenter.client.post(`/api/operators/${operatorIds.photon}/tags`, { kind: 'loop' })).status).toBe(201)
  expect((await world.owner.client.post(`/api/theories/${world.theoryId}/share-links`, {})).status).toBe(201)
})

afterAll(async () => {
  await dropScratch()
  await admin.destroy()
  rmSync(dir, { recursive: true, force: true })
})

describe('npm run backup and npm run restore', () => {
  it('restore into an empty database gives back every table, row for row, and every sequence', async () => {
    // 1. Back up the live test database (server and worker connected) and restore it into a
    //    database nothing else touches, so it can be compared at leisure.
    //    The live database may still be written by the worker (a run of an earlier test file
    //    finishing, a heartbeat): the comparison counts only when the live tables did not move
    //    while the backup was taken; otherwise the backup is taken again (at most 5 times).
    const first = join(dir, 'live.dump')
    let copy: Awaited<ReturnType<typeof databaseState>> | undefined
    const moved: string[] = []
    for (let attempt = 0; attempt < 5 && !copy; attempt++) {
      const before = publicTables(await databaseState(inject('databaseUrl')))
      const b1 = script('backup', inject('databaseUrl'), first)
      expect(b1.status, b1.out).toBe(0)
      expect(existsSync(`${first}.partial`)).toBe(false)
      const after = publicTables(await databaseState(inject('databaseUrl')))
      const changed = Object.keys(after).filter((t) => JSON.stringify(after[t]) !== JSON.stringify(before[t]))
      if (changed.length) {
        moved.push(changed.join(', '))
        await new Promise((r) => setTimeout(r, 2000))
        continue
      }
      const r1 = script('restore', urlOf(COPY), first)
      expect(r1.status, r1.out).toBe(0)
      copy = await databaseState(urlOf(COPY))
      // The app's tables match the live database (the queue's own bookkeeping may have moved on).
      expect(publicTables(copy)).toEqual(after)
    }
    expect(copy, `the live tables moved during every backup: ${moved.join(' | ')}`).toBeDefined()
    if (!copy) return
    for (const t of ['users', 'groups', 'memberships', 'theories', 'runs', 'bases', 'operators', 'annotations', 'tags', 'share_links']) {
      expect(copy.tables[`public.${t}`]!.rows, t).toBeGreaterThan(0)
    }
    // 2. Back up the quiet copy, restore into an empty database: every table and sequence equal.
    const second = join(dir, 'copy.dump')
    expect(script('backup', urlOf(COPY), second).status).toBe(0)
    const r2 = script('restore', urlOf(TARGET), second)
    expect(r2.status, r2.out).toBe(0)
    const target = await databaseState(urlOf(TARGET))
    expect(Object.keys(target.tables).length).toBeGreaterThan(20)
    expect(target).toEqual(copy)
  })

  it('restore replaces a database only when the backup went in whole, and keeps the one it replaced', async () => {
    const file = join(dir, 'again.dump')
    expect(script('backup', urlOf(COPY), file).status).toBe(0)
    const r = script('restore', urlOf(TARGET), file)
    expect(r.status, r.out).toBe(0)
    const kept = r.out.match(/kept as (\S+)/)?.[1]
    expect(kept).toMatch(/^scalewright_test_backup_target_before_restore_\d{8}_\d{6}$/)
    expect(await databaseState(urlOf(kept!))).toEqual(await databaseState(urlOf(TARGET)))
  })

  it('refuses a file that is not a backup, and a database in use, changing nothing', async () => {
    const notBackup = script('restore', urlOf(TARGET), join(root, 'package.json'))
    expect(notBackup.status).toBe(1)
    expect(notBackup.out).toMatch(/is not a backup made by npm run backup/)
    const before = await databaseState(inject('databaseUrl'))
    const busy = script('restore', inject('databaseUrl'), join(dir, 'live.dump'))
    expect(busy.status).toBe(1)
    expect(busy.out).toMatch(/connection\(s\) to scalewright_test_api are open: stop npm start and every worker/)
    expect(publicTables(await databaseState(inject('databaseUrl')))).toEqual(publicTables(before))
  })
})
