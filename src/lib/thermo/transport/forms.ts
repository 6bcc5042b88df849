/**
 * The correlation forms shared by several fluids' transport properties. Each takes its coefficients
 * from a data file (data/*.ts) and returns SI values. The paper of each fluid's coefficients is named
 * in its data file; the forms are the ones those papers write out.
 */

/** σ = Σ σ_i (1 − T/Tc)^n_i (N/m): the form of Mulero, Cachadiña & Parra (2012). */
export interface TensionSum {
	/** Tc of the correlation, K (the paper's, which may differ slightly from the equation of state's) */
	Tc: number;
	/** σ_i, N/m */
	sigma: readonly number[];
	n: readonly number[];
}

export function tensionSum(c: TensionSum, T: number): number {
	const tau = 1 - T / c.Tc;
	if (tau <= 0) return 0;
	let s = 0;
	for (let i = 0; i < c.sigma.length; i++) s += c.sigma[i] * tau ** c.n[i];
	return s;
}

/**
 * Σ N_i τ^t_i δ^d_i exp(−γ_i δ^l_i), τ = Tc/T, δ = ρ/ρc: the residual viscosity and conductivity of
 * Lemmon & Jacobsen (2004), Eqs. 4 and 6 (the unit is the data file's).
 */
export interface TauDeltaSum {
	N: readonly number[];
	t: readonly number[];
	d: readonly number[];
	l: readonly number[];
	gamma: readonly number[];
}

export function tauDeltaSum(c: TauDeltaSum, tau: number, delta: number): number {
	let s = 0;
	for (let i = 0; i < c.N.length; i++) {
		const e = c.gamma[i] === 0 ? 1 : Math.exp(-c.gamma[i] * delta ** c.l[i]);
		s += c.N[i] * tau ** c.t[i] * delta ** c.d[i] * e;
	}
	return s;
}

/**
 * Dilute-gas viscosity from a collision integral (Chapman–Enskog): η0 = 0.0266958 √(M T)/(σ² Ω(T*)) in
 * μPa·s with M in g/mol, σ in nm, T* = T/(ε/k), ln Ω = Σ b_i (ln T*)^i (Lemmon & Jacobsen 2004, Eqs. 2–3).
 */
export interface CollisionDilute {
	/** molar mass, g/mol */
	M: number;
	/** Lennard-Jones size σ, nm */
	sigmaNm: number;
	/** ε/k, K */
	epsK: number;
	/** b_i of ln Ω = Σ b_i (ln T*)^i */
	b: readonly number[];
}

/** η0 in μPa·s */
export function collisionDilute(c: CollisionDilute, T: number): number {
	const lnT = Math.log(T / c.epsK);
	let s = 0;
	for (let i = c.b.length - 1; i >= 0; i--) s = s * lnT + c.b[i];
	return (0.0266958 * Math.sqrt(c.M * T)) / (c.sigmaNm * c.sigmaNm * Math.exp(s));
}

/**
 * The simplified critical enhancement of the thermal conductivity (Olchowy & Sengers), as the
 * correlations using it write it (e.g. Lemmon & Jacobsen 2004, Eqs. 7–10; Huber et al. 2016, Eqs. 6–9):
 * λc = ρ cp R0 k_B T/(6π η ξ) (Ω − Ω0), ξ = ξ0 (Δχ/Γ)^(ν/γ),
 * Δχ = (pc ρ/ρc²) [(∂ρ/∂p)_T − (Tref/T)(∂ρ/∂p)_T at Tref], with λc = 0 where Δχ ≤ 0.
 */
export interface OlchowySengers {
	/** the correlation's critical temperature (K), density (kg/m³) and pressure (Pa) */
	Tc: number;
	rhoc: number;
	Pc: number;
	/** reference temperature, K */
	Tref: number;
	/** ξ0, m */
	xi0: number;
	/** Γ */
	Gamma: number;
	nu: number;
	gamma: number;
	/** q_D⁻¹, m */
	qDinv: number;
	R0: number;
}

const BOLTZMANN = 1.380649e-23; // J/K, exact (SI 2019)

/**
 * λc in W/(m·K). rho kg/m³, cp and cv J/(kg·K), mu Pa·s, drhodP and drhodPref (∂ρ/∂p)_T at T and at
 * Tref (same density), kg/m³ per Pa.
 */
export function olchowySengers(
	c: OlchowySengers,
	s: {
		T: number;
		rho: number;
		cp: number;
		cv: number;
		mu: number;
		drhodP: number;
		drhodPref: number;
	}
): number {
	const dchi = ((c.Pc * s.rho) / (c.rhoc * c.rhoc)) * (s.drhodP - (c.Tref / s.T) * s.drhodPref);
	if (!(dchi > 1e-14)) return 0;
	const xi = c.xi0 * (dchi / c.Gamma) ** (c.nu / c.gamma);
	const y = xi / c.qDinv;
	const d = s.rho / c.rhoc;
	const omega = (2 / Math.PI) * (((s.cp - s.cv) / s.cp) * Math.atan(y) + (s.cv / s.cp) * y);
	const omega0 = (2 / Math.PI) * (1 - Math.exp(-1 / (1 / y + (y * y) / (3 * d * d))));
	return ((s.rho * s.cp * c.R0 * BOLTZMANN * s.T) / (6 * Math.PI * s.mu * xi)) * (omega - omega0);
}

/** Avogadro's constant, 1/mol, exact (SI 2019) */
export const AVOGADRO = 6.02214076e23;

/**
 * The Rainwater–Friend second viscosity virial coefficient B_η = N_A σ³ B*_η(T*), m³/mol, with
 * B*_η = Σ b_i T*^t_i, T* = T/(ε/k), σ in nm.
 */
export function rainwaterFriendB(
	b: { b: readonly number[]; t: readonly number[] },
	epsK: number,
	sigmaNm: number,
	T: number
): number {
	const Ts = T / epsK;
	let Bstar = 0;
	for (let i = 0; i < b.b.length; i++) Bstar += b.b[i] * Ts ** b.t[i];
	return AVOGADRO * (sigmaNm * 1e-9) ** 3 * Bstar;
}

/** Dilute gas from S* (Ω(2,2) = (5/4) S*) plus the Rainwater–Friend initial-density term, μPa·s. */
export function diluteAndInitial(
	d: { chapman: number; M: number; sigmaNm: number; epsK: number; a: readonly number[] },
	b: { b: readonly number[]; t: readonly number[] },
	T: number,
	rho: number
): number {
	const lnT = Math.log(T / d.epsK);
	let s = 0;
	for (let i = d.a.length - 1; i >= 0; i--) s = s * lnT + d.a[i];
	const eta0 = (d.chapman * Math.sqrt(d.M * T)) / (d.sigmaNm * d.sigmaNm * Math.exp(s));
	const Beta = rainwaterFriendB(b, d.epsK, d.sigmaNm, T);
	return eta0 * (1 + Beta * (rho / d.M) * 1e3);
}
