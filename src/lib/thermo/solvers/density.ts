/**
 * Density at given (T, P) on a chosen branch: Halley's method (Newton's with the curvature, cubic
 * convergence; an evaluation to third order costs about a tenth more than to second, and it takes
 * one or two fewer) on f(ρ) = P(T, ρ) − P with f' = (∂P/∂ρ)_T = RT(1 + 2δαʳ_δ + δ²αʳ_δδ), kept
 * inside a bracket [lo, hi] that tightens as iterates fall on either side (bisection when a step
 * would leave it or meets (∂P/∂ρ)_T ≤ 0).
 */
import type { Fluid } from '../fluid.ts';

/**
 * Solve P(T, ρ) = P for ρ (kg/m³) starting at `guess`, with f(lo) < 0 and f(hi) > 0 known or
 * assumed (hi may be Infinity: the bracket grows). Returns NaN if no root is found.
 */
export function densityAtTP(
	fl: Fluid,
	T: number,
	P: number,
	guess: number,
	lo = 0,
	hi = Infinity
): number {
	const tau = fl.Tr / T;
	const RT = fl.R * T;
	const rhor = fl.rhor;
	let rho = guess;
	if (!(rho > lo && rho < hi))
		rho = Number.isFinite(hi) ? 0.5 * (lo + hi) : Math.max(2 * lo, 1e-12 * rhor);
	let dxOld = Infinity,
		dx = Infinity;
	for (let it = 0; it < 100; it++) {
		const r = fl.residualAt(rho / rhor, tau, 3);
		const f = rho * RT * (1 + r.d1) - P;
		const df = RT * (1 + 2 * r.d1 + r.d2);
		if (f === 0) return rho;
		if (f < 0) lo = rho;
		else hi = rho;
		let next = NaN;
		if (df > 0) {
			// Halley's step: Newton's f/f′ divided by 1 − (f/f′)·f″/(2f′), where
			// f″ = (∂²P/∂ρ²)_T = (RT/ρ)(2δαʳ_δ + 4δ²αʳ_δδ + δ³αʳ_δδδ); only while that divisor lies
			// in [½, 2] (the curvature corrects Newton's step by at most a factor of two), else Newton's
			const newton = f / df;
			const d2f = (RT / rho) * (2 * r.d1 + 4 * r.d2 + r.d3);
			const div = 1 - (0.5 * newton * d2f) / df;
			next = rho - (div >= 0.5 && div <= 2 ? newton / div : newton);
		}
		// converged: a Newton step below round-off lands on rho itself, i.e. on a bracket end; taking that
		// for "left the bracket" would throw the root away for 2ρ (with an open bracket), from where a
		// stiff liquid's isotherm (oxygen near its triple point) need not lead back
		// (rho, not next: the two agree to round-off, and rho is where the equation was just evaluated,
		// so the caller's evaluation of the state there costs nothing, Fluid.residualAt)
		if (Math.abs(next - rho) <= 1e-14 * rho) return rho;
		// with an open bracket, grow by at most a factor 4 per step (flat isotherms near Tc), and by 1.25
		// in a liquid: a near-critical liquid's flat isotherm sends Newton from ρ' to several times ρc,
		// where an equation of state may turn unphysical (negative P) and never close the bracket
		// (oxygen at 150 K toward 80 MPa)
		const grow = rho > fl.rhoc ? 1.25 : 4;
		if (!Number.isFinite(hi) && next > grow * rho) next = grow * rho;
		// rtsafe rule: bisect when Newton leaves the bracket, or stops halving once bracketed
		const slow = Number.isFinite(hi) && Math.abs(next - rho) > 0.5 * dxOld;
		dxOld = dx;
		if (!(next > lo && next < hi) || slow) {
			next = Number.isFinite(hi) ? 0.5 * (lo + hi) : 2 * rho;
		}
		dx = Math.abs(next - rho);
		if (Math.abs(next - rho) <= 1e-14 * rho) return next;
		if (Number.isFinite(hi) && hi - lo <= 4e-16 * hi) return 0.5 * (lo + hi);
		rho = next;
		if (rho > 1e3 * fl.rhoc) return NaN;
	}
	return NaN;
}
