import { spawnSync } from 'node:child_process'
import { mkdtempSync, writeFileSync, readFileSync, existsSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'

// Debian's pdflatex (texlive-latex-base/-extra and lmodern; npm test installs them when
// missing). Shell escape is off, as in a default TeX Live set-up, so a \write18 that slipped
// through would show in the log as a refused command rather than run.
export const PDFLATEX = '/usr/bin/pdflatex'

export interface Compiled {
  ok: boolean
  log: string
  pdfBytes: number
}

/** Compile a whole LaTeX document in a fresh folder; the log and whether a PDF came out. */
export function compileLatex(tex: string): Compiled {
  const dir = mkdtempSync(join(tmpdir(), 'scalewright-tex-'))
  try {
    writeFileSync(join(dir, 'export.tex'), tex)
    const run = spawnSync(PDFLATEX, ['-no-shell-escape', '-interaction=nonstopmode', '-halt-on-error', 'export.tex'], { cwd: dir, encoding: 'utf8', timeout: 60_000 })
    const logPath = join(dir, 'export.log')
    const log = existsSync(logPath) ? readFileSync(logPath, 'latin1') : run.stdout + run.stderr
    const pdf = join(dir, 'export.pdf')
    return { ok: run.status === 0 && existsSync(pdf), log, pdfBytes: existsSync(pdf) ? readFileSync(pdf).length : 0 }
  } finally {
    rmSync(dir, { recursive: true, force: true })
  }
}

/** Hostile texts a user may put in names, tags, notes and display names (issue 12, item 5). */
export const HOSTILE_TEXTS = [
  'Photons\n\\input{/etc/passwd}',
  'x\r\n\\write18{touch /tmp/scalewright-pwned}',
  '\\immediate\\write18{id}',
  'μ → e γ, α ≤ 1/137, Δm² ± 1 × 10⁻³, ψ₁, ≥ 0',
  'a < b > c \\ back\\slash',
  '100% # & _ ^ ~ { } $x$',
  'Müller, Ångström, Čech, façade, naïve, Łukasiewicz, Straße',
  '^^5cinput{/etc/passwd}',
  'line\u2028separator\u0085next\ttab\u000bvt',
  '\\catcode`\\@=0 @input{/etc/passwd}',
]
