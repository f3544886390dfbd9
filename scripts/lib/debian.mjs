// Install what the tests need from Debian's packages when it is missing (a fresh machine):
// the browser the e2e tests drive, LiE, the reference program of the group-theory checks, and
// pdflatex with Latin Modern, which compile the LaTeX export (amsmath/bm in latex-base, T1 fonts).
import { execFileSync, spawnSync } from 'node:child_process'
import { existsSync } from 'node:fs'

export const TEST_PACKAGES = [
  { pkg: 'chromium', present: () => existsSync('/usr/bin/chromium'), for: 'the browser tests' },
  { pkg: 'lie', present: () => spawnSync('sh', ['-c', 'command -v lie']).status === 0, for: 'the LiE cross-checks' },
  { pkg: 'texlive-latex-base', present: () => existsSync('/usr/bin/pdflatex'), for: 'compiling the LaTeX export' },
  { pkg: 'texlive-latex-extra', present: () => existsSync('/usr/bin/pdflatex'), for: 'compiling the LaTeX export' },
  { pkg: 'lmodern', present: () => spawnSync('sh', ['-c', 'kpsewhich lmodern.sty']).status === 0, for: "the LaTeX export's T1 fonts" },
]

/** apt-get install the packages whose program is missing; returns the names installed. */
export function ensureDebianPackages(packages) {
  const missing = packages.filter((p) => !p.present())
  if (missing.length === 0) return []
  const names = missing.map((p) => p.pkg)
  console.log(`[packages] missing ${missing.map((p) => `${p.pkg} (${p.for})`).join(', ')}: installing from Debian`)
  if (process.getuid?.() !== 0) {
    throw new Error(`install the Debian packages ${names.join(' ')} (apt-get install -y ${names.join(' ')}) or run the tests as root`)
  }
  execFileSync('apt-get', ['update'], { stdio: 'inherit' })
  execFileSync('apt-get', ['install', '-y', ...names], { stdio: 'inherit', env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } })
  return names
}
