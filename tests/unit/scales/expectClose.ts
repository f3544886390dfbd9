import { expect } from 'vitest'

/**
 * Float check that prints input, value, expected and tolerance on failure.
 * Tolerance is absolute unless `relative` is set.
 */
export function expectClose(label: string, input: unknown, value: number, expected: number, tolerance: number, relative = false): void {
  const scale = relative ? Math.abs(expected) : 1
  const ok = Number.isFinite(value) && Math.abs(value - expected) <= tolerance * scale
  expect(ok, `${label}: input ${JSON.stringify(input)} gave ${value}, expected ${expected} ± ${tolerance}${relative ? ' (relative)' : ''}`).toBe(true)
}
