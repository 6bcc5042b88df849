import type { AlphaRecord, DerivativeOrder, EvalContext, TermEvaluator } from './record.ts';

/**
 * IAPWS-95 non-analytic near-critical terms (IAPWS R6-95(2018), Eq. 6, i = 55…56, and Table 5):
 *   αʳ = Σ nᵢ·Δ^bᵢ·δ·ψ,   Δ = θ² + Bᵢ[(δ−1)²]^aᵢ,   θ = (1−τ) + Aᵢ[(δ−1)²]^(1/(2βᵢ)),
 *   ψ = exp(−Cᵢ(δ−1)² − Dᵢ(τ−1)²).
 * Written as n·G(δ)·E(δ,τ)·H(τ) with G = δ·exp(−C(δ−1)²), E = Δ^b, H = exp(−D(τ−1)²); derivatives
 * to third order come from the chain rule for E = f(Δ) and the Leibniz rule for the product.
 * The term is singular at δ = τ = 1 (the critical point): Δ is floored at 1e−100 so that values
 * stay finite there (the heat capacities then come out huge; the state builder reports them null).
 * Far from the critical point ψ underflows the sum: where C(δ−1)² + D(τ−1)² > SKIP_EXPONENT the
 * term and its derivatives (ψ times factors polynomial in δ, τ and Δ) are skipped — they change
 * no field of the record by more than 1e−32 of its value anywhere in range (checked for water,
 * carbon dioxide and nitrogen, terms.test.ts).
 */
export const SKIP_EXPONENT = 100;

export class ResidualNonAnalytic implements TermEvaluator {
	readonly kind = 'non-analytic';
	readonly maxD = 0;
	readonly maxT = 0;
	private readonly n: Float64Array;
	private readonly a: Float64Array;
	private readonly b: Float64Array;
	private readonly beta: Float64Array;
	private readonly A: Float64Array;
	private readonly B: Float64Array;
	private readonly C: Float64Array;
	private readonly D: Float64Array;

	constructor(
		n: readonly number[],
		a: readonly number[],
		b: readonly number[],
		beta: readonly number[],
		A: readonly number[],
		B: readonly number[],
		C: readonly number[],
		D: readonly number[],
		/** skip threshold (tests pass Infinity to compare) */
		private readonly skip = SKIP_EXPONENT
	) {
		this.n = Float64Array.from(n);
		this.a = Float64Array.from(a);
		this.b = Float64Array.from(b);
		this.beta = Float64Array.from(beta);
		this.A = Float64Array.from(A);
		this.B = Float64Array.from(B);
		this.C = Float64Array.from(C);
		this.D = Float64Array.from(D);
	}

	add(ctx: EvalContext, order: DerivativeOrder, rec: AlphaRecord): void {
		const delta = ctx.delta;
		const tau = ctx.tau;
		const y = delta - 1;
		const z = tau - 1;
		const ay = Math.abs(y);
		const sy = y > 0 ? 1 : y < 0 ? -1 : 0;
		const lnAy = sy === 0 ? 0 : Math.log(ay);
		const invAy = sy === 0 ? 0 : 1 / ay;
		const y2 = y * y;
		const z2 = z * z;
		for (let i = 0; i < this.n.length; i++) {
			const C = this.C[i],
				Dc = this.D[i];
			if (C * y2 + Dc * z2 > this.skip) continue;
			const n = this.n[i],
				b = this.b[i],
				A = this.A[i],
				B = this.B[i];
			const e1 = 1 / this.beta[i]; // [(δ−1)²]^(1/(2β)) = |δ−1|^(1/β)
			const e2 = 2 * this.a[i]; // [(δ−1)²]^a = |δ−1|^(2a)
			const P0 = Math.exp(-C * y2);
			const Q0 = Math.exp(-Dc * z2);
			// |δ−1|^e and its lower powers by division (at δ = 1 they are all 0, valid for e > 3)
			const pe1 = sy === 0 ? 0 : Math.exp(e1 * lnAy);
			const pe2 = sy === 0 ? 0 : Math.exp(e2 * lnAy);
			const Th0 = A * pe1;
			const M0 = B * pe2;
			const theta = -z + Th0;
			let Dl = theta * theta + M0;
			if (Dl < 1e-100) Dl = 1e-100;
			const f0 = Math.exp(b * Math.log(Dl));
			const invDl = 1 / Dl;
			const G0 = delta * P0;
			rec.a += n * G0 * f0 * Q0;
			if (order < 1) continue;

			// first derivatives of the one-variable pieces
			const Th1 = A * e1 * sy * pe1 * invAy;
			const M1 = B * e2 * sy * pe2 * invAy;
			const P1 = -2 * C * y * P0;
			const G1 = P0 + delta * P1;
			const H1 = -2 * Dc * z * Q0;
			const f1 = b * f0 * invDl;
			const Dd = 2 * theta * Th1 + M1;
			const Dt = -2 * theta;
			const E10 = f1 * Dd;
			const E01 = f1 * Dt;
			const F10 = (G1 * f0 + G0 * E10) * Q0;
			const F01 = G0 * (E01 * Q0 + f0 * H1);
			rec.d1 += n * delta * F10;
			rec.t1 += n * tau * F01;
			if (order < 2) continue;

			const Th2 = A * e1 * (e1 - 1) * pe1 * invAy * invAy;
			const M2 = B * e2 * (e2 - 1) * pe2 * invAy * invAy;
			const P2 = (4 * C * C * y2 - 2 * C) * P0;
			const G2 = 2 * P1 + delta * P2;
			const H2 = (4 * Dc * Dc * z2 - 2 * Dc) * Q0;
			const f2 = (b - 1) * f1 * invDl;
			const Ddd = 2 * Th1 * Th1 + 2 * theta * Th2 + M2;
			const Dtt = 2;
			const Ddt = -2 * Th1;
			const E20 = f2 * Dd * Dd + f1 * Ddd;
			const E02 = f2 * Dt * Dt + f1 * Dtt;
			const E11 = f2 * Dd * Dt + f1 * Ddt;
			const F20 = (G2 * f0 + 2 * G1 * E10 + G0 * E20) * Q0;
			const F02 = G0 * (E02 * Q0 + 2 * E01 * H1 + f0 * H2);
			const F11 = G1 * (E01 * Q0 + f0 * H1) + G0 * (E11 * Q0 + E10 * H1);
			rec.d2 += n * delta * delta * F20;
			rec.t2 += n * tau * tau * F02;
			rec.dt += n * delta * tau * F11;
			if (order < 3) continue;

			const Th3 = A * e1 * (e1 - 1) * (e1 - 2) * sy * pe1 * invAy * invAy * invAy;
			const M3 = B * e2 * (e2 - 1) * (e2 - 2) * sy * pe2 * invAy * invAy * invAy;
			const P3 = (-8 * C * C * C * y2 * y + 12 * C * C * y) * P0;
			const G3 = 3 * P2 + delta * P3;
			const H3 = (-8 * Dc * Dc * Dc * z2 * z + 12 * Dc * Dc * z) * Q0;
			const f3 = (b - 2) * f2 * invDl;
			const Dddd = 6 * Th1 * Th2 + 2 * theta * Th3 + M3;
			const Dddt = -2 * Th2;
			// Δ_τττ = 0 and Δ_δττ = 0
			const E30 = f3 * Dd * Dd * Dd + 3 * f2 * Dd * Ddd + f1 * Dddd;
			const E03 = f3 * Dt * Dt * Dt + 3 * f2 * Dt * Dtt;
			const E21 = f3 * Dd * Dd * Dt + f2 * (Ddd * Dt + 2 * Ddt * Dd) + f1 * Dddt;
			const E12 = f3 * Dd * Dt * Dt + f2 * (Dtt * Dd + 2 * Ddt * Dt);
			const F30 = (G3 * f0 + 3 * G2 * E10 + 3 * G1 * E20 + G0 * E30) * Q0;
			const F03 = G0 * (E03 * Q0 + 3 * E02 * H1 + 3 * E01 * H2 + f0 * H3);
			const F21 =
				G2 * (E01 * Q0 + f0 * H1) + 2 * G1 * (E11 * Q0 + E10 * H1) + G0 * (E21 * Q0 + E20 * H1);
			const F12 =
				G1 * (E02 * Q0 + 2 * E01 * H1 + f0 * H2) + G0 * (E12 * Q0 + 2 * E11 * H1 + E10 * H2);
			rec.d3 += n * delta * delta * delta * F30;
			rec.t3 += n * tau * tau * tau * F03;
			rec.d2t += n * delta * delta * tau * F21;
			rec.dt2 += n * delta * tau * tau * F12;
		}
	}
}
