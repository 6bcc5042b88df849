/**
 * Density at given (T, P) on a chosen branch: Newton on f(ρ) = P(T, ρ) − P with
 * f' = (∂P/∂ρ)_T = RT(1 + 2δαʳ_δ + δ²αʳ_δδ), kept inside a bracket [lo, hi] that tightens as
 * iterates fall on either side (bisection when Newton would leave it or meets (∂P/∂ρ)_T ≤ 0).
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
		const r = fl.residualAt(rho / rhor, tau, 2);
		const f = rho * RT * (1 + r.d1) - P;
		const df = RT * (1 + 2 * r.d1 + r.d2);
		if (f === 0) return rho;
		if (f < 0) lo = rho;
		else hi = rho;
		let next = df > 0 ? rho - f / df : NaN;
		// converged: a Newton step below round-off lands on rho itself, i.e. on a bracket end; taking that
		// for "left the bracket" would throw the root away for 2ρ (with an open bracket), from where a
		// stiff liquid's isotherm (oxygen near its triple point) need not lead back
		if (Math.abs(next - rho) <= 1e-14 * rho) return next;
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
