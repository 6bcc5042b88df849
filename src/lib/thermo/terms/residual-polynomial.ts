import {
	tableIndex,
	type AlphaRecord,
	type DerivativeOrder,
	type EvalContext,
	type TermEvaluator
} from './record.ts';

/**
 * Residual polynomial terms αʳ = Σ nᵢ·δ^dᵢ·τ^tᵢ (IAPWS R6-95(2018), Eq. 6, i = 1…7).
 * For f = nδ^dτ^t the scaled derivatives are products of falling factorials:
 *   δ^iτ^j ∂^(i+j)f/∂δ^i∂τ^j = d(d−1)…(d−i+1) · t(t−1)…(t−j+1) · f.
 * Powers: δ^d from the context's table when d is a small non-negative integer; when every t is a
 * multiple of 1/q for a small q (water's are multiples of 1/8), τ^t = (τ^(1/q))^(q·t) by
 * multiplication from one root; otherwise f = n·exp(d·ln δ + t·ln τ).
 */
export class ResidualPolynomial implements TermEvaluator {
	readonly kind = 'polynomial';
	readonly maxD: number;
	readonly maxT = 0;
	private readonly n: Float64Array;
	private readonly d: Float64Array;
	private readonly t: Float64Array;
	private readonly di: Int32Array;
	/** q·t (integers) when the root trick applies, with its offset into `tq` */
	private readonly q: number;
	private readonly qt: Int32Array;
	private readonly qMin: number;
	private readonly tq: Float64Array;

	constructor(n: readonly number[], d: readonly number[], t: readonly number[]) {
		this.n = Float64Array.from(n);
		this.d = Float64Array.from(d);
		this.t = Float64Array.from(t);
		const di = d.map(tableIndex);
		const dOk = di.every((k) => k >= 0);
		this.di = Int32Array.from(dOk ? di : d.map(() => -1));
		this.maxD = dOk ? Math.max(0, ...di) : 0;
		let q = 0;
		for (const cand of [1, 2, 4, 8, 16, 32, 64]) {
			if (
				t.every(
					(x) => Math.abs(x * cand - Math.round(x * cand)) < 1e-12 && Math.abs(x * cand) <= 256
				)
			) {
				q = cand;
				break;
			}
		}
		this.q = dOk ? q : 0;
		const k = t.map((x) => Math.round(x * (q || 1)));
		this.qt = Int32Array.from(k);
		this.qMin = Math.min(0, ...k);
		this.tq = new Float64Array(Math.max(0, ...k) - this.qMin + 1);
	}

	add(ctx: EvalContext, order: DerivativeOrder, rec: AlphaRecord): void {
		const { n, d, t, di, q, qt, qMin, tq } = this;
		const { dPow, lnDelta, lnTau } = ctx;
		if (q > 0) {
			// tq[k − qMin] = τ^(k/q)
			const root = Math.exp(lnTau / q);
			const inv = 1 / root;
			const z = -qMin;
			tq[z] = 1;
			for (let k = z + 1; k < tq.length; k++) tq[k] = tq[k - 1] * root;
			for (let k = z - 1; k >= 0; k--) tq[k] = tq[k + 1] * inv;
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
			const f =
				q > 0
					? n[i] * dPow[di[i]] * tq[qt[i] - qMin]
					: n[i] * Math.exp(d[i] * lnDelta + t[i] * lnTau);
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
