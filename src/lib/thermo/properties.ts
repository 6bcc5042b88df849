/**
 * Thermodynamic properties of a single phase at (T, ρ) from the Helmholtz record
 * (IAPWS R6-95(2018), Table 3; with α = α⁰ + αʳ, δ = ρ/ρr, τ = Tr/T):
 *   P  = ρRT(1 + δαʳ_δ)
 *   u  = RT·τ(α⁰_τ + αʳ_τ)
 *   h  = RT[1 + τ(α⁰_τ + αʳ_τ) + δαʳ_δ]
 *   s  = R[τ(α⁰_τ + αʳ_τ) − α⁰ − αʳ]
 *   g  = RT[1 + α⁰ + αʳ + δαʳ_δ]
 *   cv = −R·τ²(α⁰_ττ + αʳ_ττ)
 *   (∂P/∂ρ)_T = RT(1 + 2δαʳ_δ + δ²αʳ_δδ),   (∂P/∂T)_ρ = ρR(1 + δαʳ_δ − δτ·αʳ_δτ)
 *   cp = cv + T(∂P/∂T)_ρ² / (ρ²(∂P/∂ρ)_T),   w² = (∂P/∂ρ)_T + T(∂P/∂T)_ρ² / (ρ²·cv)
 * Units: T K, ρ kg/m³, P Pa, u h g J/kg, s cv cp J/(kg·K), w m/s.
 */
import type { Fluid } from './fluid.ts';

export class Point {
	T = 0;
	rho = 0;
	P = 0;
	/** (∂P/∂ρ)_T, Pa·m³/kg */
	dPdrho = 0;
	/** (∂P/∂T)_ρ, Pa/K */
	dPdT = 0;
	u = 0;
	h = 0;
	s = 0;
	g = 0;
	cv = 0;
	cp = 0;
	/** speed of sound (NaN where (∂P/∂ρ)_s < 0, i.e. in unstable states) */
	w = 0;
}

/**
 * Evaluate a single-phase point. order 1: P, u, h, s, g; order 2 adds cv, cp, w and the
 * pressure derivatives. Returns `out`.
 */
export function evalPoint(fl: Fluid, T: number, rho: number, out: Point, order: 1 | 2 = 2): Point {
	const delta = rho / fl.rhor;
	const tau = fl.Tr / T;
	const r = fl.residualAt(delta, tau, order);
	const ar = r.a,
		d1 = r.d1,
		t1r = r.t1,
		d2 = r.d2,
		t2r = r.t2,
		dt = r.dt;
	const i = fl.idealAt(delta, tau, order);
	const R = fl.R;
	const RT = R * T;
	const t1 = i.t1 + t1r;
	out.T = T;
	out.rho = rho;
	out.P = rho * RT * (1 + d1);
	out.u = RT * t1;
	out.h = RT * (1 + t1 + d1);
	out.s = R * (t1 - i.a - ar);
	out.g = RT * (1 + i.a + ar + d1);
	if (order < 2) return out;
	const cv = -R * (i.t2 + t2r);
	const dPdrho = RT * (1 + 2 * d1 + d2);
	const dPdT = rho * R * (1 + d1 - dt);
	out.cv = cv;
	out.dPdrho = dPdrho;
	out.dPdT = dPdT;
	const x = (T * dPdT * dPdT) / (rho * rho);
	out.cp = cv + x / dPdrho;
	out.w = Math.sqrt(dPdrho + x / cv);
	return out;
}

/** Which of u, h, s a generic solver works on. */
export type EnergyProp = 'u' | 'h' | 's';

/** Value of u, h or s at an evaluated point. */
export function propValue(p: Point, which: EnergyProp): number {
	return which === 'u' ? p.u : which === 'h' ? p.h : p.s;
}

/** ∂y/∂T at constant ρ for y = u, h, s (order-2 point). */
export function propDT(p: Point, which: EnergyProp): number {
	return which === 'u' ? p.cv : which === 'h' ? p.cv + p.dPdT / p.rho : p.cv / p.T;
}

/** ∂y/∂ρ at constant T for y = u, h, s (order-2 point). */
export function propDrho(p: Point, which: EnergyProp): number {
	const r2 = p.rho * p.rho;
	return which === 'u'
		? (p.P - p.T * p.dPdT) / r2
		: which === 'h'
			? p.dPdrho / p.rho - (p.T * p.dPdT) / r2
			: -p.dPdT / r2;
}
