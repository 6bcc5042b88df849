/**
 * Two correlation forms written out by the refrigerant papers of refrigerants.ts (coefficients in
 * data/<fluid>.ts, each paper named there):
 * - the viscosity of Huber & Assael (2016): a rational dilute-gas term, the Rainwater–Friend
 *   initial-density term and a residual in δ^(n/3) and Tr;
 * - the thermal conductivity of Perkins & Huber (2011), also that of Marsh, Perkins & Ramires (2002)
 *   for propane (hydrocarbons.ts): a polynomial dilute-gas term in Tr and a residual
 *   Σ (B1,i + B2,i Tr) δ^i.
 */

import { rainwaterFriendB, type OlchowySengers } from './forms.ts';

export interface HuberAssaelViscosity {
	/** molar mass, g/mol (to turn ρ in kg/m³ into mol/dm³) */
	M: number;
	/** η0 = Σ a_i T^i / Σ d_i T^i, μPa·s, T in K */
	dilute: { a: readonly number[]; d: readonly number[] };
	/** B*_η = Σ b_i T*^t_i, T* = T/(ε/k), B_η = N_A σ³ B*_η */
	initialDensity: {
		epsK: number;
		sigmaNm: number;
		b: readonly number[];
		t: readonly number[];
	};
	/** Δη = δ^(2/3) Tr^(1/2) [c0 + c1 δ + c2 δ² + (c3 δ + c4 δ⁶ + c5 δ Tr² + c6 δ⁵ Tr)/(c7 Tr + c8 δ Tr)] */
	residual: { Tc: number; rhocMolar: number; c: readonly number[] };
	/** the paper's range of validity (K, Pa) */
	range: { Tmin: number; Tmax: number; Pmax: number };
}

/** η in Pa·s at T (K) and ρ (kg/m³). */
export function huberAssaelViscosity(v: HuberAssaelViscosity, T: number, rho: number): number {
	const { a, d } = v.dilute;
	let num = 0;
	let den = 0;
	for (let i = a.length - 1; i >= 0; i--) num = num * T + a[i];
	for (let i = d.length - 1; i >= 0; i--) den = den * T + d[i];
	const eta0 = num / den;
	const rhoMolar = rho / v.M; // mol/dm³
	if (!(rhoMolar > 0)) return eta0 * 1e-6;
	const id = v.initialDensity;
	const Beta = rainwaterFriendB(id, id.epsK, id.sigmaNm, T); // m³/mol
	const c = v.residual.c;
	const delta = rhoMolar / v.residual.rhocMolar;
	const Tr = T / v.residual.Tc;
	const frac =
		(c[3] * delta + c[4] * delta ** 6 + c[5] * delta * Tr * Tr + c[6] * delta ** 5 * Tr) /
		(c[7] * Tr + c[8] * delta * Tr);
	const residual =
		delta ** (2 / 3) * Math.sqrt(Tr) * (c[0] + c[1] * delta + c[2] * delta * delta + frac);
	return (eta0 * (1 + Beta * rhoMolar * 1e3) + residual) * 1e-6;
}

export interface PerkinsHuberConductivity {
	/** λ0 = Σ a_i Tr^i, Tr = T/Tc, W/(m·K) */
	dilute: { Tc: number; a: readonly number[] };
	/** Δλ = Σ_{i=1..n} (B1,i + B2,i Tr) δ^i, δ = ρ/ρc (kg/m³), W/(m·K) */
	residual: { Tc: number; rhoc: number; B1: readonly number[]; B2: readonly number[] };
	/** the paper's critical enhancement (Olchowy–Sengers), SI */
	critical: OlchowySengers;
}

/** λ0 + Δλ in W/(m·K), without the critical enhancement, at T (K) and ρ (kg/m³). */
export function perkinsHuberBackground(
	c: PerkinsHuberConductivity,
	T: number,
	rho: number
): number {
	const Tr0 = T / c.dilute.Tc;
	let k0 = 0;
	for (let i = c.dilute.a.length - 1; i >= 0; i--) k0 = k0 * Tr0 + c.dilute.a[i];
	const Tr = T / c.residual.Tc;
	const delta = rho / c.residual.rhoc;
	let kr = 0;
	let dPow = 1;
	for (let i = 0; i < c.residual.B1.length; i++) {
		dPow *= delta;
		kr += (c.residual.B1[i] + c.residual.B2[i] * Tr) * dPow;
	}
	return k0 + kr;
}
