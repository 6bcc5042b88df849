/**
 * IAPWS-IF97 basic equations, region boundaries and backward equations (IAPWS R7-97(2012), Revised
 * Release on the IAPWS Industrial Formulation 1997 for the Thermodynamic Properties of Water and Steam).
 * Units inside this file follow the release: p in MPa, T in K, h in kJ/kg, s in kJ/(kg·K); the SI
 * conversion happens in state.ts. Coefficients are data in coefficients.ts.
 */
import {
	b23,
	b2bc,
	region1,
	region1TPh,
	region1TPs,
	region2,
	region2Ideal,
	region2aTPh,
	region2aTPs,
	region2bTPh,
	region2bTPs,
	region2cTPh,
	region2cTPs,
	region3,
	region3LogCoefficient,
	region4,
	region5,
	region5Ideal,
	type If97Table
} from './coefficients.ts';

/** Specific gas constant of IF97, kJ/(kg·K) (IAPWS R7-97(2012), Eq. 1). */
export const R_IF97 = 0.461526;
/** Critical temperature K, pressure MPa, density kg/m³ (IAPWS R7-97(2012), Eqs. 2–4). */
export const TC = 647.096;
export const PC = 22.064;
export const RHOC = 322;

/**
 * Dimensionless Gibbs energy γ(π, τ) = g/(RT) and its derivatives; region 3 fills the Helmholtz
 * record instead (see Helmholtz).
 */
export interface Gibbs {
	g: number;
	gp: number;
	gpp: number;
	gt: number;
	gtt: number;
	gpt: number;
	/** π and τ of the evaluation (reduced pressure and inverse reduced temperature) */
	pi: number;
	tau: number;
}

export interface Helmholtz {
	f: number;
	fd: number;
	fdd: number;
	ft: number;
	ftt: number;
	fdt: number;
	delta: number;
	tau: number;
}

/** Integer powers x^k for k in [lo, hi], by repeated multiplication (index k − lo). */
function powers(out: Float64Array, x: number, lo: number, hi: number): void {
	const i0 = -lo;
	out[i0] = 1;
	let p = 1;
	for (let k = 1; k <= hi; k++) out[i0 + k] = p *= x;
	const r = 1 / x;
	p = 1;
	for (let k = -1; k >= lo; k--) out[i0 + k] = p *= r;
}

/** A table ready for fast evaluation: exponent ranges and scratch arrays for powers. */
interface Compiled {
	I: Int32Array;
	J: Int32Array;
	n: Float64Array;
	iLo: number;
	iHi: number;
	jLo: number;
	jHi: number;
	px: Float64Array;
	py: Float64Array;
}

function compile(t: If97Table): Compiled {
	const I = Int32Array.from(t.I);
	const J = Int32Array.from(t.J);
	const iLo = Math.min(0, ...t.I) - 2;
	const iHi = Math.max(0, ...t.I);
	const jLo = Math.min(0, ...t.J) - 2;
	const jHi = Math.max(0, ...t.J);
	return {
		I,
		J,
		n: Float64Array.from(t.n),
		iLo,
		iHi,
		jLo,
		jHi,
		px: new Float64Array(iHi - iLo + 1),
		py: new Float64Array(jHi - jLo + 1)
	};
}

const scratch = { s: 0, sx: 0, sxx: 0, sy: 0, syy: 0, sxy: 0 };

/** Σ n·x^I·y^J and its first and second derivatives in x and y (into `scratch`). */
function sum2(c: Compiled, x: number, y: number): typeof scratch {
	powers(c.px, x, c.iLo, c.iHi);
	powers(c.py, y, c.jLo, c.jHi);
	const ox = -c.iLo;
	const oy = -c.jLo;
	let s = 0,
		sx = 0,
		sxx = 0,
		sy = 0,
		syy = 0,
		sxy = 0;
	for (let k = 0; k < c.n.length; k++) {
		const i = c.I[k];
		const j = c.J[k];
		const n = c.n[k];
		const xi = c.px[ox + i];
		const xi1 = c.px[ox + i - 1];
		const yj = c.py[oy + j];
		const yj1 = c.py[oy + j - 1];
		s += n * xi * yj;
		sx += n * i * xi1 * yj;
		sxx += n * i * (i - 1) * c.px[ox + i - 2] * yj;
		sy += n * j * xi * yj1;
		syy += n * j * (j - 1) * xi * c.py[oy + j - 2];
		sxy += n * i * j * xi1 * yj1;
	}
	scratch.s = s;
	scratch.sx = sx;
	scratch.sxx = sxx;
	scratch.sy = sy;
	scratch.syy = syy;
	scratch.sxy = sxy;
	return scratch;
}

const c1 = compile(region1);
const c2 = compile(region2);
const c2i = compile(region2Ideal);
const c3 = compile(region3);
const c5 = compile(region5);
const c5i = compile(region5Ideal);

/**
 * Region 1 (compressed liquid), IAPWS R7-97(2012), Eq. 7: γ = Σ nᵢ (7.1 − π)^Iᵢ (τ − 1.222)^Jᵢ,
 * π = p/16.53 MPa, τ = 1386 K/T.
 */
export function gibbs1(T: number, p: number): Gibbs {
	const pi = p / 16.53;
	const tau = 1386 / T;
	const r = sum2(c1, 7.1 - pi, tau - 1.222);
	return { g: r.s, gp: -r.sx, gpp: r.sxx, gt: r.sy, gtt: r.syy, gpt: -r.sxy, pi, tau };
}

/**
 * Ideal-gas part plus residual part (regions 2 and 5): γ = ln π + Σ n⁰ τ^J⁰ + Σ nᵢ π^Iᵢ (τ − τ₀)^Jᵢ.
 */
function gibbsGas(
	res: Compiled,
	ideal: Compiled,
	pi: number,
	tau: number,
	tauShift: number
): Gibbs {
	const o = sum2(ideal, 1, tau);
	const g0 = Math.log(pi) + o.s;
	const g0t = o.sy;
	const g0tt = o.syy;
	const r = sum2(res, pi, tau - tauShift);
	return {
		g: g0 + r.s,
		gp: 1 / pi + r.sx,
		gpp: -1 / (pi * pi) + r.sxx,
		gt: g0t + r.sy,
		gtt: g0tt + r.syy,
		gpt: r.sxy,
		pi,
		tau
	};
}

/** Region 2 (vapor), IAPWS R7-97(2012), Eqs. 15–17: π = p/1 MPa, τ = 540 K/T, residual in (τ − 0.5). */
export function gibbs2(T: number, p: number): Gibbs {
	return gibbsGas(c2, c2i, p, 540 / T, 0.5);
}

/** Region 5 (high-temperature vapor), IAPWS R7-97(2012), Eqs. 32–34: π = p/1 MPa, τ = 1000 K/T. */
export function gibbs5(T: number, p: number): Gibbs {
	return gibbsGas(c5, c5i, p, 1000 / T, 0);
}

/**
 * Region 3, IAPWS R7-97(2012), Eq. 28: φ = f/(RT) = n₁ ln δ + Σ nᵢ δ^Iᵢ τ^Jᵢ, δ = ρ/322 kg/m³,
 * τ = 647.096 K/T.
 */
export function helmholtz3(rho: number, T: number): Helmholtz {
	const delta = rho / RHOC;
	const tau = TC / T;
	const r = sum2(c3, delta, tau);
	const n1 = region3LogCoefficient;
	return {
		f: n1 * Math.log(delta) + r.s,
		fd: n1 / delta + r.sx,
		fdd: -n1 / (delta * delta) + r.sxx,
		ft: r.sy,
		ftt: r.syy,
		fdt: r.sxy,
		delta,
		tau
	};
}

/** Region 3 pressure, MPa, at ρ (kg/m³) and T (K): p = ρRT δ φ_δ. */
export function pressure3(rho: number, T: number): { p: number; dpdrho: number } {
	const a = helmholtz3(rho, T);
	const RT = R_IF97 * T;
	// p in MPa: ρ (kg/m³) · R (kJ/(kg·K)) · T → kPa; /1000 → MPa
	return {
		p: (rho * RT * a.delta * a.fd) / 1000,
		dpdrho: (RT * (2 * a.delta * a.fd + a.delta * a.delta * a.fdd)) / 1000
	};
}

/**
 * Saturation pressure (region 4), IAPWS R7-97(2012), Eq. 30, MPa; 273.15 K ≤ T ≤ 647.096 K.
 */
export function psat(T: number): number {
	const n = region4;
	const th = T + n[8] / (T - n[9]);
	const A = th * th + n[0] * th + n[1];
	const B = n[2] * th * th + n[3] * th + n[4];
	const C = n[5] * th * th + n[6] * th + n[7];
	const q = (2 * C) / (-B + Math.sqrt(B * B - 4 * A * C));
	return q * q * q * q;
}

/** Saturation temperature (region 4), IAPWS R7-97(2012), Eq. 31, K; 611.213 Pa ≤ p ≤ 22.064 MPa. */
export function tsat(p: number): number {
	const n = region4;
	const beta = Math.sqrt(Math.sqrt(p));
	const E = beta * beta + n[2] * beta + n[5];
	const F = n[0] * beta * beta + n[3] * beta + n[6];
	const G = n[1] * beta * beta + n[4] * beta + n[7];
	const D = (2 * G) / (-F - Math.sqrt(F * F - 4 * E * G));
	return (n[9] + D - Math.sqrt((n[9] + D) * (n[9] + D) - 4 * (n[8] + n[9] * D))) / 2;
}

/** B23 boundary between regions 2 and 3: p(T), MPa, IAPWS R7-97(2012), Eq. 5; 623.15 K ≤ T ≤ 863.15 K. */
export function pB23(T: number): number {
	return b23[0] + b23[1] * T + b23[2] * T * T;
}

/** B23 boundary between regions 2 and 3: T(p), K, IAPWS R7-97(2012), Eq. 6; 16.529 MPa ≤ p ≤ 100 MPa. */
export function tB23(p: number): number {
	return b23[3] + Math.sqrt((p - b23[4]) / b23[2]);
}

/** B2bc boundary between subregions 2b and 2c: p(h), MPa, IAPWS R7-97(2012), Eq. 20. */
export function pB2bc(h: number): number {
	return b2bc[0] + b2bc[1] * h + b2bc[2] * h * h;
}

/** B2bc boundary between subregions 2b and 2c: h(p), kJ/kg, IAPWS R7-97(2012), Eq. 21. */
export function hB2bc(p: number): number {
	return b2bc[3] + Math.sqrt((p - b2bc[4]) / b2bc[2]);
}

/** Σ nᵢ x^Iᵢ y^Jᵢ with real exponents (backward equations; not on the hot path). */
function sumPow(t: If97Table, x: number, y: number): number {
	let s = 0;
	for (let k = 0; k < t.n.length; k++) s += t.n[k] * Math.pow(x, t.I[k]) * Math.pow(y, t.J[k]);
	return s;
}

/** Backward equation T(p, h) for region 1, K: IAPWS R7-97(2012), Eq. 11 (π = p/1 MPa, η = h/2500 kJ/kg). */
export function t1ph(p: number, h: number): number {
	return sumPow(region1TPh, p, h / 2500 + 1);
}

/** Backward equation T(p, s) for region 1, K: IAPWS R7-97(2012), Eq. 13 (π = p/1 MPa, σ = s/1 kJ/(kg·K)). */
export function t1ps(p: number, s: number): number {
	return sumPow(region1TPs, p, s + 2);
}

/**
 * Backward equation T(p, h) for region 2, K: IAPWS R7-97(2012), Eqs. 22–24, subregion 2a for
 * p ≤ 4 MPa, 2b above it for h ≥ h_B2bc(p), else 2c (η = h/2000 kJ/kg).
 */
export function t2ph(p: number, h: number): number {
	const eta = h / 2000;
	if (p <= 4) return sumPow(region2aTPh, p, eta - 2.1);
	if (h >= hB2bc(p)) return sumPow(region2bTPh, p - 2, eta - 2.6);
	return sumPow(region2cTPh, p + 25, eta - 1.8);
}

/**
 * Backward equation T(p, s) for region 2, K: IAPWS R7-97(2012), Eqs. 25–27, subregion 2a for
 * p ≤ 4 MPa, 2b above it for s ≥ 5.85 kJ/(kg·K), else 2c.
 */
export function t2ps(p: number, s: number): number {
	if (p <= 4) return sumPow(region2aTPs, p, s / 2 - 2);
	if (s >= 5.85) return sumPow(region2bTPs, p, 10 - s / 0.7853);
	return sumPow(region2cTPs, p, 2 - s / 2.9251);
}
