import { createHash } from 'node:crypto'

/** JSON with object keys sorted, so that equal inputs give equal text whatever their key order. */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v) ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) : v,
  )
}

export function inputKey(kind: string, input: unknown): string {
  return createHash('sha256').update(kind).update('\0').update(canonicalJson(input)).digest('base64url')
}

export type Settled = { ok: true; value: unknown } | { ok: false; error: Error }

/**
 * Results (and refusals: an input over budget stays over budget) by input key, least recently
 * used first out, bounded by entry count and by the total size of their JSON text.
 */
export class ResultCache {
  private entries = new Map<string, { settled: Settled; bytes: number }>()
  private bytes = 0
  constructor(
    private maxEntries: number,
    private maxBytes: number,
  ) {}

  get(key: string): Settled | undefined {
    const hit = this.entries.get(key)
    if (!hit) return undefined
    this.entries.delete(key)
    this.entries.set(key, hit)
    return hit.settled
  }

  set(key: string, settled: Settled) {
    const bytes = settled.ok ? (JSON.stringify(settled.value)?.length ?? 0) : settled.error.message.length
    if (bytes > this.maxBytes / 4) return
    this.delete(key)
    this.entries.set(key, { settled, bytes })
    this.bytes += bytes
    for (const [oldest, entry] of this.entries) {
      if (this.entries.size <= this.maxEntries && this.bytes <= this.maxBytes) break
      this.entries.delete(oldest)
      this.bytes -= entry.bytes
    }
  }

  private delete(key: string) {
    const old = this.entries.get(key)
    if (old) this.bytes -= old.bytes
    this.entries.delete(key)
  }
}
