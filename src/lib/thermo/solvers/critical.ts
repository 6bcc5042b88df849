/**
 * The equation's own critical point: (∂P/∂ρ)_T = 0 and (∂²P/∂ρ²)_T = 0, i.e. with reduced
 * derivatives f1 = 1 + 2δαʳ_δ + δ²αʳ_δδ = 0 and f2 = 2δαʳ_δ + 4δ²αʳ_δδ + δ³αʳ_δδδ = 0.
 * Published critical points are rounded, and some equations (e.g. R-134a) are reduced at values
 * that differ from their critical point; saturation must end exactly where the equation's own
 * two phases merge. Newton in (τ, δ) with a finite-difference Jacobian from the published point;
 * if the published point already satisfies both conditions to round-off (water, whose
 * non-analytic terms pin it), it is kept. Pc is then P from the equation at (Tc, ρc).
 */
import type { Fluid } from '../fluid.ts';

function conditions(fl: Fluid, delta: number, tau: number): [number, number] {
	const r = fl.residualAt(delta, tau, 3);
	return [1 + 2 * r.d1 + r.d2, 2 * r.d1 + 4 * r.d2 + r.d3];
}

/** Refine fl.Tc, fl.rhoc, fl.Pc to the equation's critical point (idempotent). */
export function refineCriticalPoint(fl: Fluid): void {
	if (fl.cache.criticalRefined) return;
	fl.cache.criticalRefined = true;
	const seed = fl.data.equationCriticalGuess ?? fl.data.critical;
	let delta = seed.rho / fl.rhor;
	let tau = fl.Tr / seed.T;
	let [f1, f2] = conditions(fl, delta, tau);
	if (!(Math.abs(f1) < 1e-9 && Math.abs(f2) < 1e-6)) {
		for (let it = 0; it < 50; it++) {
			const hd = 1e-6 * delta,
				ht = 1e-7 * tau;
			const [a1, a2] = conditions(fl, delta + hd, tau);
			const [b1, b2] = conditions(fl, delta, tau + ht);
			const j11 = (a1 - f1) / hd,
				j12 = (b1 - f1) / ht;
			const j21 = (a2 - f2) / hd,
				j22 = (b2 - f2) / ht;
			const det = j11 * j22 - j12 * j21;
			if (!Number.isFinite(det) || det === 0) return;
			let sd = -(f1 * j22 - j12 * f2) / det;
			let st = -(j11 * f2 - f1 * j21) / det;
			const lim = 0.05;
			const m = Math.max(Math.abs(sd) / (lim * delta), Math.abs(st) / (lim * tau), 1);
			sd /= m;
			st /= m;
			delta += sd;
			tau += st;
			[f1, f2] = conditions(fl, delta, tau);
			if (Math.abs(sd) < 1e-12 * delta && Math.abs(st) < 1e-13 * tau) break;
		}
		// accept only a clean solution near the published point
		const Tc = fl.Tr / tau,
			rhoc = delta * fl.rhor;
		if (
			!(Math.abs(f1) < 1e-8) ||
			!(Math.abs(Tc / seed.T - 1) < 1e-3) ||
			!(Math.abs(rhoc / seed.rho - 1) < 0.05)
		)
			return;
		fl.Tc = Tc;
		fl.rhoc = rhoc;
	} else {
		fl.Tc = fl.data.critical.T;
		fl.rhoc = fl.data.critical.rho;
	}
	const r = fl.residualAt(fl.rhoc / fl.rhor, fl.Tr / fl.Tc, 1);
	fl.Pc = fl.rhoc * fl.R * fl.Tc * (1 + r.d1);
}
