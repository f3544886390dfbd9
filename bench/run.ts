/**
 * Benchmark runner: imports every bench/*.bench.ts (or those named on the command line),
 * calls its default export (an async function returning named figures) and prints one JSON
 * line per figure: {"bench": "<file>", "name": "<figure>", ...fields}. A figure that is a
 * plain number is printed as {"median_ms": n}. A failing bench prints {"bench", "error"}
 * and makes the exit code 1. Usage: npm run bench [-- count running ...]
 */
import { readdirSync } from 'node:fs'
import { dirname, join } from 'node:path'
import { fileURLToPath, pathToFileURL } from 'node:url'

const here = dirname(fileURLToPath(import.meta.url))

async function main(): Promise<void> {
  const wanted = process.argv.slice(2)
  const files = readdirSync(here)
    .filter((f) => f.endsWith('.bench.ts'))
    .filter((f) => wanted.length === 0 || wanted.includes(f.replace(/\.bench\.ts$/, '')))
    .sort()
  for (const file of files) {
    const bench = file.replace(/\.bench\.ts$/, '')
    try {
      const mod = (await import(pathToFileURL(join(here, file)).href)) as { default?: () => Promise<unknown> }
      if (typeof mod.default !== 'function') throw new Error('no default export function')
      const figures = await mod.default()
      for (const [name, value] of Object.entries(figures as Record<string, unknown>)) {
        const fields = typeof value === 'number' ? { median_ms: value } : (value as Record<string, unknown>)
        console.log(JSON.stringify({ bench, name, ...fields }))
      }
    } catch (e) {
      console.log(JSON.stringify({ bench, error: (e as Error).message }))
      process.exitCode = 1
    }
  }
}

await main()
