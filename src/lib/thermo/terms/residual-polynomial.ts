import {
	PowerSet,
	type AlphaRecord,
	type DerivativeOrder,
	type EvalContext,
	type TermEvaluator
} from './record.ts';

/**
 * Residual polynomial terms αʳ = Σ nᵢ·δ^dᵢ·τ^tᵢ (IAPWS R6-95(2018), Eq. 6, i = 1…7).
 * For f = nδ^dτ^t the scaled derivatives are products of falling factorials:
 *   δ^iτ^j ∂^(i+j)f/∂δ^i∂τ^j = d(d−1)…(d−i+1) · t(t−1)…(t−j+1) · f.
 * The τ part nᵢ·τ^tᵢ and the δ part δ^dᵢ are kept for the last τ and the last δ seen, so a solver
 * holding T or ρ fixed recomputes only the other; powers come from PowerSet (multiplications and
 * square roots when the exponents are multiples of 1/8 — water's t are — else one exp each).
 */
export class ResidualPolynomial implements TermEvaluator {
	readonly kind = 'polynomial';
	readonly maxD = 0;
	readonly maxT = 0;
	private readonly n: Float64Array;
	private readonly d: Float64Array;
	private readonly t: Float64Array;
	private readonly dPows: PowerSet;
	private readonly tPows: PowerSet;
	/** nᵢ·τ^tᵢ at tauAt, δ^dᵢ at deltaAt */
	private readonly nt: Float64Array;
	private readonly dp: Float64Array;
	private tauAt = NaN;
	private deltaAt = NaN;

	constructor(n: readonly number[], d: readonly number[], t: readonly number[]) {
		this.n = Float64Array.from(n);
		this.d = Float64Array.from(d);
		this.t = Float64Array.from(t);
		this.dPows = new PowerSet(this.d);
		this.tPows = new PowerSet(this.t);
		this.nt = new Float64Array(n.length);
		this.dp = new Float64Array(n.length);
	}

	add(ctx: EvalContext, order: DerivativeOrder, rec: AlphaRecord): void {
		const { n, d, t, nt, dp } = this;
		if (ctx.tau !== this.tauAt) {
			this.tPows.fill(ctx.tau, ctx.lnTau, nt);
			for (let i = 0; i < n.length; i++) nt[i] *= n[i];
			this.tauAt = ctx.tau;
		}
		if (ctx.delta !== this.deltaAt) {
			this.dPows.fill(ctx.delta, ctx.lnDelta, dp);
			this.deltaAt = ctx.delta;
		}
		let a = 0,
			d1 = 0,
			t1 = 0,
			d2 = 0,
			t2 = 0,
			dt = 0,
			d3 = 0,
			t3 = 0,
			d2t = 0,
			dt2 = 0;
		for (let i = 0; i < n.length; i++) {
			const f = nt[i] * dp[i];
			a += f;
			if (order < 1) continue;
			const D1 = d[i];
			const T1 = t[i];
			d1 += D1 * f;
			t1 += T1 * f;
			if (order < 2) continue;
			const D2 = D1 * (D1 - 1);
			const T2 = T1 * (T1 - 1);
			d2 += D2 * f;
			t2 += T2 * f;
			dt += D1 * T1 * f;
			if (order < 3) continue;
			d3 += D2 * (D1 - 2) * f;
			t3 += T2 * (T1 - 2) * f;
			d2t += D2 * T1 * f;
			dt2 += D1 * T2 * f;
		}
		rec.a += a;
		rec.d1 += d1;
		rec.t1 += t1;
		rec.d2 += d2;
		rec.t2 += t2;
		rec.dt += dt;
		rec.d3 += d3;
		rec.t3 += t3;
		rec.d2t += d2t;
		rec.dt2 += dt2;
	}
}
