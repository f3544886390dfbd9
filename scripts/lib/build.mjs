// Build the Nuxt app when .output is missing or older than any source file.
import { execFileSync } from 'node:child_process'
import { existsSync, readdirSync, statSync } from 'node:fs'
import { join, resolve } from 'node:path'

const root = resolve(import.meta.dirname, '..', '..')
const SOURCES = [
  'nuxt.config.ts',
  'app.vue',
  'package-lock.json',
  'tailwind.config.ts',
  'pages',
  'components',
  'layouts',
  'stores',
  'composables',
  'server',
  'shared',
  'migrations',
  'seeds',
  'assets',
  'public',
  'middleware',
  'plugins',
]

function newestMtime(path) {
  if (!existsSync(path)) return 0
  const st = statSync(path)
  if (!st.isDirectory()) return st.mtimeMs
  let newest = st.mtimeMs
  for (const entry of readdirSync(path)) newest = Math.max(newest, newestMtime(join(path, entry)))
  return newest
}

export function buildIfStale({ force = false } = {}) {
  const marker = join(root, '.output', 'nitro.json')
  const built = existsSync(marker) ? statSync(marker).mtimeMs : 0
  const source = Math.max(...SOURCES.map((s) => newestMtime(join(root, s))))
  if (!force && built > source) return false
  console.log('[build] building the app (nuxt build, ~1 min)…')
  execFileSync(process.execPath, [join(root, 'node_modules', 'nuxt', 'bin', 'nuxt.mjs'), 'build'], { cwd: root, stdio: 'inherit', env: { ...process.env, NODE_ENV: 'production' } })
  return true
}
