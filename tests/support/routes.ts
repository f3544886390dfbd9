import { readdirSync, statSync } from 'node:fs'
import { join, relative, resolve } from 'node:path'

const apiDir = resolve(import.meta.dirname, '..', '..', 'server', 'api')

/** Every route file under server/api as "METHOD /api/path/[param]" (index segments dropped). */
export function listRoutes(dir = apiDir): string[] {
  const out: string[] = []
  for (const entry of readdirSync(dir)) {
    const full = join(dir, entry)
    if (statSync(full).isDirectory()) {
      out.push(...listRoutes(full))
      continue
    }
    const m = /^(.*)\.(get|post|put|patch|delete)\.ts$/.exec(relative(apiDir, full))
    if (!m) continue
    const path = `/api/${m[1]}`.replace(/\/index$/, '').replace(/\\/g, '/')
    out.push(`${m[2]!.toUpperCase()} ${path}`)
  }
  return out.sort()
}

export function mutatingRoutes(): string[] {
  return listRoutes().filter((r) => !r.startsWith('GET '))
}
