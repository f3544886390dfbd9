/**
 * Bring your own basis from the command line: is a list of operators, typed as papers print
 * them (one per line; blank lines and lines starting with % or # skipped), a complete and
 * independent set at one order (one flavour)?
 *   npm run --silent check-basis -- THEORY.json --order N --operators FILE [--alias phi=H ...] [--format json|csv|latex]
 * (order = dimension − 4; --dim D gives the dimension directly.) Prints JSON
 * {"complete","independent","rank","required","missing":[{"class","operator"}],"redundant":[{"operator","relation":[…]}],
 * "translation":[{"operator","timesI","hermitian","terms":[{"class","operator","coefficient"}]}],"classes":[…]},
 * or the translation matrix as CSV or LaTeX. Exit code 1 with a message on stderr for bad input.
 */
import { readFileSync } from 'node:fs'
import { parseTheory } from '../server/engine/theory/parseTheory'
import { checkOperatorList } from '../server/engine/notation/index'
import { translationCsv, translationLatex } from '../server/engine/notation/exportCheck'
import { massRatioDimension } from '../server/engine/rules/defaultWeights'
import { EngineError } from '../server/engine/errors'

function usage(msg: string): never {
  process.stderr.write(`check-basis: ${msg}\nusage: npm run --silent check-basis -- THEORY.json --order N --operators FILE [--alias phi=H] [--format json|csv|latex]\n`)
  process.exit(1)
}

function valueOf(args: string[], name: string): string | undefined {
  const i = args.indexOf(name)
  if (i < 0) return undefined
  const v = args[i + 1]
  if (v === undefined || v.startsWith('--')) usage(`${name} needs a value`)
  return v
}

function readText(path: string, what: string): string {
  try {
    return readFileSync(path, 'utf8')
  } catch {
    usage(`cannot read the ${what} file ${path}`)
  }
}

function main(): void {
  const args = process.argv.slice(2)
  const file = args.find((a, i) => !a.startsWith('--') && (i === 0 || !args[i - 1]!.startsWith('--')))
  if (!file) usage('missing THEORY.json')
  const order = valueOf(args, '--order')
  const dim = valueOf(args, '--dim')
  if ((order === undefined) === (dim === undefined)) usage('give --order N or --dim D')
  const n = Number(order ?? dim)
  if (!Number.isInteger(n) || n < 0) usage(`the order or dimension must be a whole number, not ${order ?? dim}`)
  const opsFile = valueOf(args, '--operators') ?? usage('missing --operators FILE')
  const format = valueOf(args, '--format') ?? 'json'
  if (!['json', 'csv', 'latex'].includes(format)) usage(`--format is json, csv or latex, not ${format}`)
  const aliases: Record<string, string> = {}
  args.forEach((a, i) => {
    if (a !== '--alias') return
    const m = /^([^=]+)=(.+)$/.exec(args[i + 1] ?? '')
    if (!m) usage('--alias needs NAME=FIELD, e.g. --alias phi=H')
    aliases[m[1]!] = m[2]!
  })
  let theoryJson: unknown
  try {
    theoryJson = JSON.parse(readText(file, 'theory'))
  } catch (e) {
    usage(e instanceof SyntaxError ? `${file} is not JSON: ${e.message}` : String(e))
  }
  try {
    const theory = parseTheory(theoryJson)
    const dimension = dim !== undefined ? n : massRatioDimension(n)
    const report = checkOperatorList(theory, dimension, readText(opsFile, 'operators').split('\n'), { aliases })
    process.stdout.write(format === 'csv' ? translationCsv(report) : format === 'latex' ? translationLatex(report) : JSON.stringify(report) + '\n')
  } catch (e) {
    if (e instanceof EngineError) usage(e.message)
    throw e
  }
}

main()
