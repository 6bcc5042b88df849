/**
 * Viscosity and thermal conductivity of the fluids other than water, at (T, ρ) from the fluid's own
 * equation of state (cp, cv and (∂ρ/∂p)_T for the critical enhancement). Coefficients: data/*.ts.
 */
import { criticalEnhancement } from './enhancement.ts';
import { AVOGADRO, collisionDilute, diluteAndInitial, tauDeltaSum } from './forms.ts';
import { ammoniaViscosity } from './data/ammonia.ts';
import { co2Conductivity, co2Viscosity } from './data/carbon-dioxide.ts';
import { r134aConductivity, r134aViscosity } from './data/r134a.ts';
import { lemmonJacobsen2004, lemmonJacobsenCritical } from './data/lemmon-jacobsen-2004.ts';
import { isobutane, propane } from './hydrocarbons.ts';
import { hydrogen, methane } from './gases.ts';
import { r1234yfTransport, r1234zeETransport } from './refrigerants.ts';

const R_MOLAR = 8.314462618; // J/(mol·K), exact (SI 2019)

/** where a correlation holds (K, Pa); a bound left out is the equation of state's */
export interface TransportRange {
	Tmin?: number;
	Tmax?: number;
	Pmax?: number;
}

export interface FluidCorrelation {
	/** the publications, for `sources` */
	sources: { mu: string; k: string };
	/** where each correlation is applied (beyond the equation of state's own range) */
	range: { mu: TransportRange; k: TransportRange };
	mu(T: number, rho: number): number;
	/** needs μ (Pa·s) for the critical enhancement; absent where no conductivity correlation is built */
	k?(T: number, rho: number, mu: number): number;
	/** why k is absent when `k` is */
	noK?: string;
}

const LJ = 'Lemmon & Jacobsen (2004), Int. J. Thermophys. 25, 21';

function lemmonJacobsen(fluid: 'nitrogen' | 'argon' | 'oxygen' | 'air'): FluidCorrelation {
	const f = lemmonJacobsen2004[fluid];
	const rhoc = f.rhocMolar * f.dilute.M; // kg/m³ (mol/dm³ × g/mol)
	const critical = lemmonJacobsenCritical(f);
	return {
		sources: { mu: LJ, k: `${LJ} (critical enhancement with this engine's equation of state)` },
		range: { mu: {}, k: {} },
		mu(T, rho) {
			const eta0 = collisionDilute(f.dilute, T);
			return (eta0 + tauDeltaSum(f.viscosity, f.Tc / T, rho / rhoc)) * 1e-6;
		},
		k(T, rho, mu) {
			const tau = f.Tc / T;
			const eta0 = collisionDilute(f.dilute, T);
			const cd = f.conductivityDilute;
			let k0 = cd.N1 * eta0;
			for (let i = 0; i < cd.N.length; i++) k0 += cd.N[i] * tau ** cd.t[i];
			const kr = tauDeltaSum(f.conductivity, tau, rho / rhoc);
			return (k0 + kr) * 1e-3 + criticalEnhancement(fluid, critical, T, rho, mu);
		}
	};
}

const carbonDioxide: FluidCorrelation = {
	sources: {
		mu: 'Laesecke & Muzny (2017), J. Phys. Chem. Ref. Data 46, 013107',
		k: 'Huber, Sykioti, Assael & Perkins (2016), J. Phys. Chem. Ref. Data 45, 013102 (critical enhancement with this engine’s equation of state)'
	},
	range: { mu: {}, k: co2Conductivity.range },
	mu(T, rho) {
		const v = co2Viscosity;
		const a = v.dilute.a;
		const t3 = Math.cbrt(T);
		const den =
			a[0] +
			a[1] * T ** (1 / 6) +
			a[2] * Math.exp(a[3] * t3) +
			(a[4] + a[5] * t3) / Math.exp(t3) +
			a[6] * Math.sqrt(T);
		const eta0 = ((v.dilute.numerator * Math.sqrt(T)) / den) * 1e-3; // Pa·s
		const id = v.initialDensity;
		const Ts = T / id.epsK;
		let Bstar = 0;
		for (let i = 0; i < id.b.length; i++) Bstar += id.b[i] * Ts ** id.t[i];
		const Beta = AVOGADRO * id.sigma ** 3 * Bstar; // m³/mol
		const r = v.residual;
		const etaTL =
			(r.rhoTL ** (2 / 3) * Math.sqrt(R_MOLAR * r.Tt)) / (v.M ** (1 / 6) * Math.cbrt(AVOGADRO));
		const Tr = T / r.Tt;
		const rr = rho / r.rhoTL;
		const residual = etaTL * (r.c1 * Tr * rr ** 3 + (rr * rr + rr ** r.gamma) / (Tr - r.c2));
		return eta0 * (1 + Beta * (rho / v.M)) + residual;
	},
	k(T, rho, mu) {
		const c = co2Conductivity;
		const Tr = T / c.dilute.Tc;
		let den = 0;
		for (let i = 0; i < c.dilute.L.length; i++) den += c.dilute.L[i] / Tr ** i;
		const k0 = (Math.sqrt(Tr) / den) * 1e-3;
		const rr = rho / c.residual.rhoc;
		let kr = 0;
		for (let i = 0; i < 6; i++) kr += (c.residual.B1[i] + c.residual.B2[i] * Tr) * rr ** (i + 1);
		return k0 + kr + criticalEnhancement('carbon-dioxide', c.critical, T, rho, mu);
	}
};

const r134a: FluidCorrelation = {
	sources: {
		mu: 'Huber, Laesecke & Perkins (2003), Ind. Eng. Chem. Res. 42, 3163 (its R-134a correlation)',
		k: 'Perkins, Laesecke, Howley, Ramires, Gurova & Cusco (2000), NISTIR 6605 (critical enhancement with this engine’s equation of state)'
	},
	range: { mu: {}, k: {} },
	mu(T, rho) {
		const v = r134aViscosity;
		const r = v.residual;
		const tau = r.Tc / T;
		const delta = rho / r.rhoc;
		let h = 0;
		for (let i = 0; i < r.e.length; i++) h += r.e[i] * tau ** r.t[i] * delta ** r.d[i];
		const Tr = T / r.Tc;
		const delta0 = r.c10 / (1 + r.c8 * Tr + r.c9 * Tr * Tr);
		h += r.c7 * (1 / (delta0 - delta) - 1 / delta0);
		return (diluteAndInitial(v.dilute, v.initialDensity, T, rho) + h * 1e3) * 1e-6;
	},
	k(T, rho, mu) {
		const c = r134aConductivity;
		const k0 = c.dilute.a[0] + c.dilute.a[1] * T;
		const d = rho / c.residual.rhoRed;
		let kr = 0;
		for (let i = c.residual.b.length - 1; i >= 0; i--) kr = (kr + c.residual.b[i]) * d;
		return k0 + c.residual.lambdaRed * kr + criticalEnhancement('r134a', c.critical, T, rho, mu);
	}
};

const ammonia: FluidCorrelation = {
	sources: {
		mu: 'Monogenidou, Assael & Huber (2018), J. Phys. Chem. Ref. Data 47, 023102',
		k: ''
	},
	range: { mu: ammoniaViscosity.range, k: {} },
	mu(T, rho) {
		const v = ammoniaViscosity;
		const r = v.residual;
		const tau = r.Tc / T;
		const delta = rho / r.rhoc;
		let dEta = 0;
		for (let i = 0; i < r.n.length; i++) dEta += r.n[i] * tau ** r.t[i] * delta ** r.d[i];
		return (diluteAndInitial(v.dilute, v.initialDensity, T, rho) + dEta) * 1e-6;
	},
	noK: 'The thermal conductivity correlation of Monogenidou, Assael & Huber (2018) is not built into the engine: its one public copy misses the paper’s tables above 600 kg/m³.'
};

/** The fluids with viscosity and conductivity correlations (water apart: water.ts). */
export const fluidCorrelations: Record<string, FluidCorrelation> = {
	nitrogen: lemmonJacobsen('nitrogen'),
	argon: lemmonJacobsen('argon'),
	oxygen: lemmonJacobsen('oxygen'),
	air: lemmonJacobsen('air'),
	'carbon-dioxide': carbonDioxide,
	ammonia,
	r134a,
	propane,
	isobutane,
	hydrogen,
	methane,
	r1234yf: r1234yfTransport,
	'r1234ze-e': r1234zeETransport
};
