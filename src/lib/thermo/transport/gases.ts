/**
 * Viscosity and thermal conductivity of normal hydrogen (and, below, methane), at (T, ρ) with the
 * critical enhancement from this engine's own equation of state. Coefficients and their provenance:
 * data/hydrogen.ts, data/methane.ts.
 */
import { evalPoint, Point } from '../properties.ts';
import { getCompiledFluid } from '../registry.ts';
import { olchowySengers, type OlchowySengers } from './forms.ts';
import type { FluidCorrelation } from './fluids.ts';
import { hydrogenTransport } from './data/hydrogen.ts';

const AVOGADRO = 6.02214076e23; // 1/mol, exact (SI 2019)

const at = new Point();
const atRef = new Point();

/** λc (W/(m·K)) of the simplified Olchowy–Sengers form, cp, cv, (∂ρ/∂p)_T from the fluid's equation of state. */
function olchowySengersHere(
	fluid: string,
	c: OlchowySengers,
	T: number,
	rho: number,
	mu: number
): number {
	if (rho <= 0) return 0;
	const fl = getCompiledFluid(fluid);
	evalPoint(fl, T, rho, at, 2);
	evalPoint(fl, c.Tref, rho, atRef, 2);
	if (!(at.dPdrho > 0) || !(atRef.dPdrho > 0)) return 0;
	return olchowySengers(c, {
		T,
		rho,
		cp: at.cp,
		cv: at.cv,
		mu,
		drhodP: 1 / at.dPdrho,
		drhodPref: 1 / atRef.dPdrho
	});
}

/**
 * η0 (1 + B_η ρ_n) in μPa·s: the dilute gas from S* (η0 = chapman √(M T)/(σ² S*), ln S* = Σ a_i (ln T*)^i)
 * and the Rainwater–Friend initial-density term B_η = N_A σ³ Σ b_i T*^t_i. M g/mol, σ nm, ρ kg/m³.
 */
function diluteAndInitialDensity(
	d: {
		chapman: number;
		M: number;
		sigmaNm: number;
		epsK: number;
		a: readonly number[];
	},
	b: { b: readonly number[]; t: readonly number[] },
	T: number,
	rho: number
): number {
	const lnT = Math.log(T / d.epsK);
	let s = 0;
	for (let i = d.a.length - 1; i >= 0; i--) s = s * lnT + d.a[i];
	const eta0 = (d.chapman * Math.sqrt(d.M * T)) / (d.sigmaNm * d.sigmaNm * Math.exp(s));
	const Ts = T / d.epsK;
	let Bstar = 0;
	for (let i = 0; i < b.b.length; i++) Bstar += b.b[i] * Ts ** b.t[i];
	const Beta = AVOGADRO * (d.sigmaNm * 1e-9) ** 3 * Bstar; // m³/mol
	return eta0 * (1 + Beta * ((rho / d.M) * 1e3));
}

const H2 = hydrogenTransport;

/** Normal hydrogen: Muzny, Huber & Kazakov (2013) and Assael et al. (2011). */
export const hydrogen: FluidCorrelation = {
	sources: {
		mu: 'Muzny, Huber & Kazakov (2013), J. Chem. Eng. Data 58, 969, with its 2022 erratum',
		k: 'Assael, Assael, Huber, Perkins & Takata (2011), J. Phys. Chem. Ref. Data 40, 033101 (normal hydrogen; critical enhancement with this engine’s equation of state)'
	},
	range: { mu: H2.viscosity.range, k: H2.conductivity.range },
	mu(T, rho) {
		const v = H2.viscosity;
		const c = v.residual.c;
		const Tr = T / H2.Tc;
		const r2 = (rho / v.residual.rhoSc) ** 2;
		const dEta =
			c[0] * r2 * Math.exp(c[1] * Tr + c[2] / Tr + (c[3] * r2) / (c[4] + Tr) + c[5] * r2 ** 3);
		return (diluteAndInitialDensity(v.dilute, v.initialDensity, T, rho) + dEta) * 1e-6;
	},
	k(T, rho, mu) {
		const c = H2.conductivity;
		const Tr = T / H2.Tc;
		let num = 0;
		for (let i = c.dilute.A1.length - 1; i >= 0; i--) num = num * Tr + c.dilute.A1[i];
		let den = 0;
		for (let i = c.dilute.A2.length - 1; i >= 0; i--) den = den * Tr + c.dilute.A2[i];
		const rr = rho / H2.rhoc;
		let dk = 0;
		for (let i = 0; i < c.residual.B1.length; i++)
			dk += (c.residual.B1[i] + c.residual.B2[i] * Tr) * rr ** (i + 1);
		return num / den + dk + olchowySengersHere('hydrogen', c.critical, T, rho, mu);
	}
};
