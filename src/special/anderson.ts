/**
 * Anderson acceleration of depth one for fixed-point iterations $x = g(x)$. Part of the
 * library's own numerical toolkit (`special/internal.ts`), not exported from the package.
 *
 * Accuracy: exact (to rounding) for affine maps in one unknown, where the step is the secant
 * step; on the fixture's nonlinear system (`test/fixtures/toolkit/`, fixed point from mpmath's
 * findroot) the accelerated iteration reaches the fixed point within 1e-14 relative (to the last
 * digit measured) in 18 iterations where plain iteration needs 50.
 *
 * @packageDocumentation
 */

/**
 * One Anderson(1) mixing step: with the residuals $r = (g(x) - x)/s$ and
 * $r' = (g(x') - x')/s$ of the current and previous iterates (componentwise scaled by `scale`),
 * $\gamma = \langle r, r - r'\rangle / \lVert r - r'\rVert^2$ and the next iterate is
 * $g(x) - \gamma\,(g(x) - g(x'))$. Allocation-free.
 *
 * @param size - number of unknowns
 * @param x - current iterate
 * @param g - g(x)
 * @param previousX - previous iterate
 * @param previousG - g at the previous iterate
 * @param scale - positive scale of each unknown (its typical size)
 * @param out - next iterate (written)
 * @returns `false` (and `out` untouched) when the residuals did not change, so no step exists
 */
export function andersonStep(
  size: number,
  x: ArrayLike<number>,
  g: ArrayLike<number>,
  previousX: ArrayLike<number>,
  previousG: ArrayLike<number>,
  scale: ArrayLike<number>,
  out: { [index: number]: number },
): boolean {
  let numerator = 0;
  let denominator = 0;
  for (let i = 0; i < size; i++) {
    const s = scale[i]!;
    const r = (g[i]! - x[i]!) / s;
    const d = r - (previousG[i]! - previousX[i]!) / s;
    numerator += r * d;
    denominator += d * d;
  }
  if (!(denominator > 0) || !Number.isFinite(denominator)) return false;
  const gamma = numerator / denominator;
  for (let i = 0; i < size; i++) out[i] = g[i]! - gamma * (g[i]! - previousG[i]!);
  return true;
}
