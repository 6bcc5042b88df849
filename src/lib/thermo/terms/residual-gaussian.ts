import type { AlphaRecord, DerivativeOrder, EvalContext, TermEvaluator } from './record.ts';

/**
 * Residual Gaussian bell-shaped terms
 *   αʳ = Σ nᵢ·δ^dᵢ·τ^tᵢ·exp(−αᵢ(δ − εᵢ)² − βᵢ(τ − γᵢ)²)   (IAPWS R6-95(2018), Eq. 6, i = 52…54).
 * The term separates into A(δ)·B(τ). With ϑ = δ·∂/∂δ and k = d − 2αδ(δ − ε):
 *   ϑA = k·A,  ϑ²A = (ϑk + k²)·A,  ϑ³A = (ϑ²k + 3k·ϑk + k³)·A,
 *   ϑk = −2αδ(2δ − ε),  ϑ²k = −2αδ(4δ − ε);
 * likewise for τ with m = t − 2βτ(τ − γ). Scaled derivatives follow from
 *   δ²A''/A = ϑ²/A − ϑ/A and δ³A'''/A = ϑ³/A − 3ϑ²/A + 2ϑ/A.
 * A term whose bell has fallen below exp(−SKIP_EXPONENT) is skipped with its derivatives (factors
 * polynomial in δ and τ): no field of the record changes by more than 1e−32 of its value anywhere
 * in range (terms.test.ts).
 */
export const SKIP_EXPONENT = 100;

export class ResidualGaussian implements TermEvaluator {
	readonly kind = 'gaussian';
	readonly maxD = 0;
	readonly maxT = 0;
	private readonly n: Float64Array;
	private readonly d: Float64Array;
	private readonly t: Float64Array;
	private readonly alpha: Float64Array;
	private readonly beta: Float64Array;
	private readonly gamma: Float64Array;
	private readonly epsilon: Float64Array;

	constructor(
		n: readonly number[],
		d: readonly number[],
		t: readonly number[],
		alpha: readonly number[],
		beta: readonly number[],
		gamma: readonly number[],
		epsilon: readonly number[],
		/** skip threshold (tests pass Infinity to compare) */
		private readonly skip = SKIP_EXPONENT
	) {
		this.n = Float64Array.from(n);
		this.d = Float64Array.from(d);
		this.t = Float64Array.from(t);
		this.alpha = Float64Array.from(alpha);
		this.beta = Float64Array.from(beta);
		this.gamma = Float64Array.from(gamma);
		this.epsilon = Float64Array.from(epsilon);
	}

	add(ctx: EvalContext, order: DerivativeOrder, rec: AlphaRecord): void {
		const { n, d, t, alpha, beta, gamma, epsilon, skip } = this;
		const { delta, tau, lnDelta, lnTau } = ctx;
		for (let i = 0; i < n.length; i++) {
			const al = alpha[i],
				be = beta[i],
				ga = gamma[i],
				ep = epsilon[i];
			const dd = delta - ep;
			const tt = tau - ga;
			const e = d[i] * lnDelta + t[i] * lnTau - al * dd * dd - be * tt * tt;
			if (e < -skip) continue;
			const f = n[i] * Math.exp(e);
			rec.a += f;
			if (order < 1) continue;
			const k = d[i] - 2 * al * delta * dd;
			const m = t[i] - 2 * be * tau * tt;
			rec.d1 += k * f;
			rec.t1 += m * f;
			if (order < 2) continue;
			const dk = -2 * al * delta * (2 * delta - ep);
			const dm = -2 * be * tau * (2 * tau - ga);
			const a2 = dk + k * k;
			const b2 = dm + m * m;
			const D2 = a2 - k;
			const T2 = b2 - m;
			rec.d2 += D2 * f;
			rec.t2 += T2 * f;
			rec.dt += k * m * f;
			if (order < 3) continue;
			const ddk = -2 * al * delta * (4 * delta - ep);
			const ddm = -2 * be * tau * (4 * tau - ga);
			const a3 = ddk + 3 * k * dk + k * k * k;
			const b3 = ddm + 3 * m * dm + m * m * m;
			rec.d3 += (a3 - 3 * a2 + 2 * k) * f;
			rec.t3 += (b3 - 3 * b2 + 2 * m) * f;
			rec.d2t += D2 * m * f;
			rec.dt2 += k * T2 * f;
		}
	}
}
