/**
 * The order whose size the scale ladder takes as 1: the power counting of each frame.
 *
 * - relativistic and heavy-particle frames: order n is the n-th correction, (E/M)^n or 1/m^n,
 *   relative to the renormalizable Lagrangian (order 0);
 * - Goldstone frame: order n is the chiral order p^n, and the leading Lagrangian is already p²;
 *   an operator of order p^k is suppressed by (p/Λ_χ)^(k−2) relative to it, with Λ_χ ≈ 4πF
 *   (naive dimensional analysis: Manohar and Georgi, Nucl. Phys. B 234 (1984) 189).
 * The board's heading, the scale ladder's estimate and "set aside below" all read this one rule.
 * @example leadingOrderOf('goldstone') // 2: order 6 is estimated as ε⁴ with ε = p/Λ_χ
 */
export function leadingOrderOf(frame: string | undefined): number {
  return frame === 'goldstone' ? 2 : 0
}

/** Power of the counting parameter that estimates an order. @example suppressionPower(6, 'goldstone') // 4 */
export function suppressionPower(order: number, frame: string | undefined): number {
  return order - leadingOrderOf(frame)
}
