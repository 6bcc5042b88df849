/**
 * Viscosity and thermal conductivity of normal hydrogen (and, below, methane), at (T, ρ) with the
 * critical enhancement from this engine's own equation of state. Coefficients and their provenance:
 * data/hydrogen.ts, data/methane.ts.
 */
import { criticalEnhancement } from './enhancement.ts';
import { diluteAndInitial } from './forms.ts';
import { evalPoint, Point } from '../properties.ts';
import { getCompiledFluid } from '../registry.ts';
import type { FluidCorrelation } from './fluids.ts';
import { hydrogenTransport } from './data/hydrogen.ts';
import { methaneTransport } from './data/methane.ts';
import { satAtT } from '../solvers/saturation.ts';

const methanePoint = new Point();

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
		return (diluteAndInitial(v.dilute, v.initialDensity, T, rho) + dEta) * 1e-6;
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
		return num / den + dk + criticalEnhancement('hydrogen', c.critical, T, rho, mu);
	}
};

const CH4 = methaneTransport;

/** Friend et al. (1989): the dilute-gas viscosity η0, μPa·s */
function methaneEta0(T: number): number {
	const v = CH4.viscosity;
	const Ts = T / v.epsK;
	let invOmega = 0;
	for (let i = 0; i < v.C.length; i++) invOmega += v.C[i] * Ts ** ((i - 3) / 3);
	return v.eta0 * Math.sqrt(Ts) * invOmega;
}

/** Methane: Friend, Ely & Ingham (1989), with this engine's equation of state where λ needs one. */
export const methane: FluidCorrelation = {
	sources: {
		mu: 'Friend, Ely & Ingham (1989), J. Phys. Chem. Ref. Data 18, 583',
		k: 'Friend, Ely & Ingham (1989), J. Phys. Chem. Ref. Data 18, 583 (ideal-gas heat capacity, saturated-vapor density and critical enhancement from this engine’s equation of state; within 3 % of the critical temperature and density the enhancement of the paper’s Eq. 19, not its scaled form)'
	},
	range: { mu: CH4.range, k: CH4.range },
	mu(T, rho) {
		const v = CH4.viscosity;
		const delta = rho / CH4.rhoc;
		const tau = CH4.Tc / T;
		let num = 0;
		for (let i = 0; i < v.g.length; i++) num += v.g[i] * delta ** v.r[i] * tau ** v.s[i];
		const etaR = (v.factor * num) / (1 + v.g9 * delta + v.g10 * delta * tau);
		return (methaneEta0(T) + etaR) * 1e-6;
	},
	k(T, rho, mu) {
		const c = CH4.conductivity;
		const fl = getCompiledFluid('methane');
		const Ts = T / CH4.viscosity.epsK;
		// c_v⁰/R = −τ² ∂²φ⁰/∂τ² of the ideal part (which does not depend on δ)
		const cv0R = -fl.idealAt(1, fl.Tr / T, 2).t2;
		const k0 = c.lambda0 * methaneEta0(T) * (3.75 + (c.f[0] + c.f[1] / Ts) * (cv0R - 1.5));
		if (!(rho > 0)) return k0 * 1e-3;
		const delta = rho / CH4.rhoc;
		const tau = CH4.Tc / T;
		let sum = 0;
		for (let i = 0; i < c.j.length; i++) sum += c.j[i] * delta ** c.r[i] * tau ** c.s[i];
		const deltaSigma = T < fl.Tc && delta < 1 ? satAtT(fl, T).rhoV / CH4.rhoc : 1;
		const kr = c.factor * (sum + (c.j7 * delta * delta) / deltaSigma);
		// λc, Eq. 19, with (∂p/∂T)_ρ and (∂p/∂ρ)_T of this engine's equation of state
		const at = evalPoint(fl, T, rho, methanePoint, 2);
		const X = at.dPdT / (rho * fl.R);
		const Y = at.dPdrho / (fl.R * T);
		let kc = 0;
		if (Y > 0) {
			const cc = c.critical;
			const chi = (cc.chi * delta * tau) / Y;
			const Tp = 1 - T / CH4.Tc;
			const rp = 1 - delta;
			const F = Math.exp(-cc.FT * Math.sqrt(Math.abs(Tp)) - cc.Frho * rp * rp - cc.FA * rp);
			kc = (cc.A / (mu * 1e6 * tau * tau)) * X * X * chi ** cc.power * F;
		}
		return (k0 + kr + kc) * 1e-3;
	}
};
