/**
 * The common shape of a central potential V(r) for the radial solver, in atomic units (hartree, bohr).
 *
 * Every potential in ./potentials builds one of these from validated parameters. Besides V(r) it
 * carries what the solver needs to lay out its grid and to decide what "bound" means:
 *  - `threshold`: lim V(r) as r → ∞ (0 for Coulomb-like and short-range potentials, +∞ for confining
 *    ones); a bound level lies below it.
 *  - `originCharge`: Z₀ in V ≈ −Z₀/r as r → 0 (0 when V is finite there), used for the regular start
 *    u ≈ r^{l+1}(1 − Z₀r/(l+1)) of the outward integration.
 *  - `tailCharge`: Z_∞ in V ≈ −Z_∞/r as r → ∞ (0 for short-range or confining potentials). A positive
 *    tail charge means infinitely many levels and a hydrogen comparison.
 *  - `lengthScale`: the size of the low levels (bohr), a first guess for the grid's extent.
 *  - `hardWall`: radius where u = 0 is imposed (infinite well) — the grid ends there.
 *  - `outerLimit`: largest radius where V may be evaluated (tabulated data without a tail); the grid
 *    ends there and a level that has not died out by then is refused.
 *  - `breakpoint`: a radius where V or a derivative jumps; the grid is laid so that it is a grid point.
 *  - `jump`: at the breakpoint, V(b⁺) − V(b⁻) and V'(b⁺) − V'(b⁻) (hartree, hartree/bohr); with it the
 *    solver corrects its scheme there and keeps order 4. evaluate(b) must return the mean of the sides.
 *  - `smooth`: false when V has a jump the solver is not told of, so the error estimate uses order 2.
 *  - `rangeEnd`: for short-range potentials, a radius beyond which |V| is below double-precision
 *    significance; there the zero-energy solution is free and the number of bound levels is exact.
 */
export interface PotentialAsymptotes {
  threshold: number;
  originCharge: number;
  tailCharge: number;
}

export interface Potential {
  /** Machine name of the kind, e.g. "yukawa". */
  id: string;
  /** Short human label with the parameter values, e.g. "Yukawa, Z = 1, λ = 0.1 bohr⁻¹". */
  label: string;
  /** The formula in plain text with units, and its source. */
  formula: string;
  /** V(r) in hartree for r in bohr (r > 0). */
  evaluate(r: number): number;
  asymptotes: PotentialAsymptotes;
  lengthScale: number;
  hardWall?: number;
  outerLimit?: number;
  innerLimit?: number;
  breakpoint?: number;
  jump?: { dV: number; dVprime: number };
  rangeEnd?: number;
  smooth: boolean;
}
