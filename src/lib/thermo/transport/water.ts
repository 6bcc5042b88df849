/**
 * Water's transport and interface properties, SI units:
 * - viscosity μ (Pa·s), IAPWS R12-08, Eq. 10. The critical enhancement μ̄2 (Eqs. 13–21) is computed
 *   inside the region where the release says it cannot be neglected — 645.91 K < T < 650.77 K and
 *   245.8 kg/m³ < ρ < 405.3 kg/m³ (from memory of the release) — and set to 1 elsewhere, as the
 *   release allows for industrial use; its reference (∂ρ/∂p)_T at 1.5 Tc comes from R15-11's Eq. 25;
 * - thermal conductivity λ (W/(m·K)), IAPWS R15-11, Eq. 10 with the critical enhancement λ̄2 (Eqs. 18–22)
 *   and the reference ζ̄(T̄_R) of the release's industrial form (Eq. 25, Table 6);
 * - surface tension σ (N/m), IAPWS R1-76(2014): σ = B τ^μ (1 + b τ), τ = 1 − T/Tc, on the saturation line.
 * Coefficients: water-coefficients.ts.
 */
import {
	conductivityL0,
	conductivityL1,
	conductivityZetaRef,
	viscosityH0,
	viscosityH1
} from './water-coefficients.ts';

/** Reference constants of R12-08 and R15-11: T* = 647.096 K, ρ* = 322 kg/m³, p* = 22.064 MPa, μ* = 1e−6 Pa·s, λ* = 1e−3 W/(m·K). */
const T_STAR = 647.096;
const RHO_STAR = 322;
const P_STAR = 22.064e6;
/** R15-11, Eq. 18: specific gas constant 0.46151805 kJ/(kg·K) (that of IAPWS-95), in J/(kg·K) */
const R_95 = 461.51805;

/** R12-08: the region where μ̄2 cannot be neglected (from memory of the release). */
export const viscosityCriticalRegion = {
	Tmin: 645.91,
	Tmax: 650.77,
	rhoMin: 245.8,
	rhoMax: 405.3
} as const;

/**
 * Viscosity of water, Pa·s, at density ρ (kg/m³) and temperature T (K): IAPWS R12-08, Eq. 10 with
 * μ̄0 from Eq. 11 and μ̄1 from Eq. 12; μ̄2 from Eqs. 13–21 when `drhodP` ((∂ρ/∂p)_T in kg/m³ per Pa)
 * is given and (ρ, T) lies in viscosityCriticalRegion, else 1.
 */
export function waterViscosity(rho: number, T: number, drhodP?: number): number {
	const Tr = T / T_STAR;
	const d = rho / RHO_STAR;
	let den = 0;
	for (let i = 0; i < viscosityH0.length; i++) den += viscosityH0[i] / Tr ** i;
	const mu0 = (100 * Math.sqrt(Tr)) / den;
	const x = 1 / Tr - 1;
	const y = d - 1;
	let sum = 0;
	const { I, J, H } = viscosityH1;
	for (let k = 0; k < H.length; k++) sum += H[k] * x ** I[k] * y ** J[k];
	const mu1 = Math.exp(d * sum);
	const c = viscosityCriticalRegion;
	const critical =
		drhodP !== undefined && T > c.Tmin && T < c.Tmax && rho > c.rhoMin && rho < c.rhoMax;
	return mu0 * mu1 * (critical ? viscosityEnhancement(d, Tr, drhodP as number) : 1) * 1e-6;
}

/**
 * μ̄2 = exp(x_μ Y), IAPWS R12-08, Eqs. 14–21: x_μ = 0.068, q_C⁻¹ = 1.9 nm, q_D⁻¹ = 1.1 nm, ξ from
 * Eq. 20 (ξ0 = 0.13 nm, Γ0 = 0.06, ν = 0.630, γ = 1.239), Δχ̄ from Eq. 21 with T̄_R = 1.5.
 */
function viscosityEnhancement(d: number, Tr: number, drhodP: number): number {
	const dchi = d * ((P_STAR / RHO_STAR) * drhodP - (zetaRef(d) * 1.5) / Tr);
	if (!(dchi > 0)) return 1;
	const xi = 0.13 * (dchi / 0.06) ** (0.63 / 1.239);
	const qc = 1 / 1.9;
	const qd = 1 / 1.1;
	let Y: number;
	if (xi <= 0.3817016416) {
		// Eq. 15
		Y =
			(qc / 5) *
			xi *
			(qd * xi) ** 5 *
			(1 - qc * xi + (qc * xi) ** 2 - (765 / 504) * (qd * xi) ** 2);
	} else {
		const psiD = Math.acos((1 + qd * qd * xi * xi) ** -0.5); // Eq. 17
		const w = Math.sqrt(Math.abs((qc * xi - 1) / (qc * xi + 1))) * Math.tan(psiD / 2); // Eq. 19
		const Lw = qc * xi > 1 ? Math.log((1 + w) / (1 - w)) : 2 * Math.atan(Math.abs(w)); // Eq. 18
		const q = qc * xi;
		// Eq. 16
		Y =
			Math.sin(3 * psiD) / 12 -
			Math.sin(2 * psiD) / (4 * q) +
			((1 - (5 / 4) * q * q) / (q * q)) * Math.sin(psiD) -
			((1 - (3 / 2) * q * q) * psiD - Math.abs(q * q - 1) ** 1.5 * Lw) / q ** 3;
	}
	return Math.exp(0.068 * Y);
}

/** λ̄0·λ̄1 of R15-11 (Eqs. 16, 17), W/(m·K): the conductivity without its critical enhancement. */
export function waterConductivityBackground(rho: number, T: number): number {
	const Tr = T / T_STAR;
	const d = rho / RHO_STAR;
	let den = 0;
	for (let i = 0; i < conductivityL0.length; i++) den += conductivityL0[i] / Tr ** i;
	const k0 = Math.sqrt(Tr) / den;
	const x = 1 / Tr - 1;
	const y = d - 1;
	let sum = 0;
	const { I, J, L } = conductivityL1;
	for (let k = 0; k < L.length; k++) sum += L[k] * x ** I[k] * y ** J[k];
	return k0 * Math.exp(d * sum) * 1e-3;
}

/** R15-11, Eq. 25 (industrial use): ζ̄ = (∂ρ̄/∂p̄)_T at T̄_R = 1.5 and reduced density ρ̄. */
function zetaRef(d: number): number {
	const j = conductivityZetaRef.upTo.findIndex((end) => d <= end);
	const a = conductivityZetaRef.a[j];
	let s = 0;
	for (let i = a.length - 1; i >= 0; i--) s = s * d + a[i];
	return 1 / s;
}

/**
 * Thermal conductivity of water, W/(m·K): IAPWS R15-11, Eq. 10, λ = λ0·λ1 + λ2, with the critical
 * enhancement λ̄2 = Λ ρ̄ c̄p T̄/μ̄ Z(y) (Eq. 18, Λ = 177.8514), Z from Eq. 19, y = q̄_D ξ with ξ from
 * Eqs. 20–22 (ξ0 = 0.13 nm, Γ0 = 0.06, ν = 0.630, γ = 1.239, 1/q̄_D = 0.40 nm) and ζ̄(T̄_R) from Eq. 25.
 * Needs the state's cp, cp/cv, (∂ρ/∂p)_T (kg/m³ per Pa) and the viscosity μ (Pa·s).
 */
export function waterConductivity(
	rho: number,
	T: number,
	cp: number,
	cv: number,
	drhodP: number,
	mu: number
): number {
	const background = waterConductivityBackground(rho, T);
	const d = rho / RHO_STAR;
	const Tr = T / T_STAR;
	const dchi = d * ((P_STAR / RHO_STAR) * drhodP - (zetaRef(d) * 1.5) / Tr);
	if (!(dchi > 0)) return background;
	const xi = 0.13 * (dchi / 0.06) ** (0.63 / 1.239);
	const y = xi / 0.4;
	if (y < 1.2e-7) return background;
	const kappa = cp / cv;
	const Z =
		(2 / (Math.PI * y)) *
		((1 - 1 / kappa) * Math.atan(y) +
			y / kappa -
			(1 - Math.exp(-1 / (1 / y + (y * y) / (3 * d * d)))));
	const k2 = ((177.8514 * d * (cp / R_95) * Tr) / (mu / 1e-6)) * Z;
	return background + k2 * 1e-3;
}

/** IAPWS R1-76(2014): Tc = 647.096 K, B = 235.8 mN/m, b = −0.625, μ = 1.256. */
export function waterSurfaceTension(T: number): number {
	const tau = 1 - T / T_STAR;
	return 235.8e-3 * tau ** 1.256 * (1 - 0.625 * tau);
}

/** Validity of the correlations, from memory of R12-08 and R15-11 (their full ranges, to 1000 MPa). */
export const waterTransportRange = { Tmin: 273.15, Tmax: 1173.15, Pmax: 1000e6 } as const;
/** R1-76(2014) holds from the triple point to the critical point (and extrapolates to 248.15 K in supercooled water). */
export const waterTensionRange = { Tmin: 273.16, Tmax: 647.096 } as const;
