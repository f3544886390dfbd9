import { resolve } from 'node:path'
import { pathToFileURL } from 'node:url'

/**
 * The compute thread runs the engine from its TypeScript source through tsx: beside the source
 * when we run from it (worker process, tests), else from the repository the built server runs in.
 */
export function computeThreadEntry(): URL {
  const here = import.meta.url
  if (here.endsWith('.ts')) return new URL('../../worker/computeThreadBoot.mjs', here)
  return pathToFileURL(resolve(process.env.SCALEWRIGHT_ROOT || process.cwd(), 'server/worker/computeThreadBoot.mjs'))
}
