import { z } from 'zod'

/**
 * Goldstone frame of a theory ("frame": "goldstone"): a chiral Lagrangian of the Goldstone
 * bosons of a coset G/H, counted by chiral order (powers of p: a derivative and l_μ, r_μ count
 * p¹; the scalar sources s, p and the field strengths count p²).
 *
 * - coset: "chiral" = SU(N)_L × SU(N)_R / SU(N)_V (N ≥ 2), "orthogonal" = O(N+1)/O(N) (N ≥ 1);
 *   N may be "general" (no relation specific to a given N).
 * - sources: external scalar sources s, p (χ = 2B(s + ip)) and vector sources l_μ, r_μ
 *   (traceless), each switched on or off; singletVector adds the U(1)_V source v_μ^(s) (its
 *   field strength, a flavor singlet: the photon of N = 2 needs it), counts only, chiral coset.
 *   Tensor sources and the axial singlet (U(1)_A) are not offered.
 * - theta: a θ term is present, so P is not a symmetry: P-odd (C-even) terms are counted too.
 * - maxOrder: highest chiral order counted (an even power of p, 2 … 14); explicit bases are
 *   built up to p⁶ (SU(N) cosets).
 * - decayConstant: the name used for F on screens (default "F"); Λ_χ ≈ 4πF on the scale ladder.
 * The field roster of the theory is not used by this frame (extra matter is not offered).
 */
const NameSchema = z.string().regex(/^[A-Za-z][A-Za-z0-9_]{0,15}$/, {
  message: 'a name is a letter followed by up to 15 letters, digits or "_"',
})

export const GOLDSTONE_MAX_ORDER = 14
export const GOLDSTONE_MAX_N = 12

export const GoldstoneFrameSchema = z
  .object({
    coset: z.enum(['chiral', 'orthogonal'], { message: 'coset must be "chiral" (SU(N)×SU(N)/SU(N)) or "orthogonal" (O(N+1)/O(N))' }),
    N: z.union([z.number().int({ message: 'N is a whole number or "general"' }), z.literal('general')], { message: 'N is a whole number or "general"' }),
    sources: z
      .object({
        scalar: z.boolean({ message: 'sources.scalar is true or false (the sources s, p)' }),
        vector: z.boolean({ message: 'sources.vector is true or false (the sources l_μ, r_μ)' }),
        singletVector: z.boolean({ message: 'sources.singletVector is true or false (the singlet vector source v_μ of U(1)_V)' }).optional(),
      })
      .strict(),
    theta: z.boolean().optional(),
    maxOrder: z.number().int({ message: 'the highest chiral order is a whole number (a power of p)' }),
    decayConstant: NameSchema.optional(),
    goldstoneName: NameSchema.optional(),
    description: z.string().max(400).optional(),
  })
  .strict()
  .superRefine((g, ctx) => {
    const bad = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message: `Goldstone frame: ${message}` })
    const lowest = g.coset === 'chiral' ? 2 : 1
    if (g.N !== 'general' && (g.N < lowest || g.N > GOLDSTONE_MAX_N)) {
      bad('N', `N must be from ${lowest} to ${GOLDSTONE_MAX_N} (or "general") for the ${g.coset} coset, but N = ${g.N}`)
    }
    if (g.sources.singletVector && g.coset !== 'chiral') {
      bad('sources', 'the singlet vector source belongs to the chiral coset SU(N)×SU(N)/SU(N); for O(N+1)/O(N) switch it off')
    }
    if (g.maxOrder < 2 || g.maxOrder > GOLDSTONE_MAX_ORDER || g.maxOrder % 2 !== 0) {
      bad('maxOrder', `the highest chiral order is an even power of p from 2 to ${GOLDSTONE_MAX_ORDER}, but maxOrder = ${g.maxOrder}`)
    }
  })

export type GoldstoneFrame = z.infer<typeof GoldstoneFrameSchema>

/** The block and the frame go together: one line of the theory check. */
export function checkGoldstoneFrame(frame: string, block: GoldstoneFrame | undefined, report: (path: (string | number)[], message: string) => void): void {
  if (block !== undefined && frame !== 'goldstone') report(['goldstone'], 'a Goldstone block needs the Goldstone frame; choose that frame, or remove the block')
  if (block === undefined && frame === 'goldstone') report(['goldstone'], 'the Goldstone frame needs its Goldstone block (coset, N, sources, highest chiral order); declare it')
}
