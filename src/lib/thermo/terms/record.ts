/**
 * The record every Helmholtz term adds into, and the per-evaluation context the terms share.
 *
 * The record holds the reduced Helmholtz energy α(δ, τ) and its derivatives in scaled form,
 * the form the property relations use (IAPWS R6-95(2018), Table 3):
 *   a = α,  d1 = δ·α_δ,  d2 = δ²·α_δδ,  d3 = δ³·α_δδδ,
 *   t1 = τ·α_τ,  t2 = τ²·α_ττ,  t3 = τ³·α_τττ,
 *   dt = δτ·α_δτ,  d2t = δ²τ·α_δδτ,  dt2 = δτ²·α_δττ.
 * `order` says how far a term must go: 0 → a; 1 → + d1, t1; 2 → + d2, t2, dt; 3 → + d3, t3, d2t, dt2.
 * Fields above the requested order are left at zero by the terms (a fluid's cached ideal part may
 * carry higher orders from an earlier call).
 */

export type DerivativeOrder = 0 | 1 | 2 | 3;

export class AlphaRecord {
	a = 0;
	d1 = 0;
	t1 = 0;
	d2 = 0;
	t2 = 0;
	dt = 0;
	d3 = 0;
	t3 = 0;
	d2t = 0;
	dt2 = 0;

	reset(): void {
		this.a = 0;
		this.d1 = 0;
		this.t1 = 0;
		this.d2 = 0;
		this.t2 = 0;
		this.dt = 0;
		this.d3 = 0;
		this.t3 = 0;
		this.d2t = 0;
		this.dt2 = 0;
	}

	copyFrom(o: AlphaRecord): void {
		this.a = o.a;
		this.d1 = o.d1;
		this.t1 = o.t1;
		this.d2 = o.d2;
		this.t2 = o.t2;
		this.dt = o.dt;
		this.d3 = o.d3;
		this.t3 = o.t3;
		this.d2t = o.d2t;
		this.dt2 = o.dt2;
	}
}

/**
 * Values shared by all terms of one evaluation at (δ, τ): logarithms and tables of integer powers
 * (built by multiplication once, read by every term).
 */
export class EvalContext {
	delta = 1;
	tau = 1;
	lnDelta = 0;
	lnTau = 0;
	/** dPow[k] = δ^k for k = 0…maxD (built by multiplication, squaring where it can) */
	readonly dPow: Float64Array;
	/** tPow[k] = τ^k for k = 0…maxT */
	readonly tPow: Float64Array;

	constructor(maxD: number, maxT: number) {
		this.dPow = new Float64Array(maxD + 1);
		this.tPow = new Float64Array(maxT + 1);
	}

	/** Set (δ, τ); a table is rebuilt only when its variable changed (solvers often hold T or ρ fixed). */
	set(delta: number, tau: number): void {
		if (delta !== this.tableDelta) {
			this.delta = delta;
			this.lnDelta = Math.log(delta);
			const dp = this.dPow;
			dp[0] = 1;
			if (dp.length > 1) dp[1] = delta;
			// by squaring where possible: a short chain of dependent multiplications
			for (let k = 2; k < dp.length; k++)
				dp[k] = k & 1 ? dp[k - 1] * delta : dp[k >> 1] * dp[k >> 1];
			this.tableDelta = delta;
		}
		if (tau !== this.tableTau) {
			this.tau = tau;
			this.lnTau = Math.log(tau);
			const tp = this.tPow;
			tp[0] = 1;
			if (tp.length > 1) tp[1] = tau;
			for (let k = 2; k < tp.length; k++) tp[k] = k & 1 ? tp[k - 1] * tau : tp[k >> 1] * tp[k >> 1];
			this.tableTau = tau;
		}
	}

	/** Set (δ, τ) and their logarithms only (for the ideal part, which reads no tables). */
	setLogs(delta: number, tau: number): void {
		if (delta !== this.tableDelta) {
			this.delta = delta;
			this.lnDelta = Math.log(delta);
			this.tableDelta = NaN;
		}
		if (tau !== this.tableTau) {
			this.tau = tau;
			this.lnTau = Math.log(tau);
			this.tableTau = NaN;
		}
	}

	private tableDelta = NaN;
	private tableTau = NaN;
}

/** Largest integer exponent served from the power tables; larger or fractional ones use exp(e·ln x). */
export const MAX_TABLE_EXPONENT = 64;

/** An exponent's table index if it is a small non-negative integer, else −1 (use Math.pow). */
export function tableIndex(e: number): number {
	return Number.isInteger(e) && e >= 0 && e <= MAX_TABLE_EXPONENT ? e : -1;
}

/**
 * x^eᵢ for a fixed list of exponents eᵢ, filled all at once for a new x > 0. When every eᵢ is a
 * multiple of 1/q for q = 1, 2, 4 or 8 (the integer, half, quarter and eighth exponents of most
 * registered fluids), x^eᵢ = x^⌊eᵢ⌋·(x^(1/q))^j with x^(1/q) from one, two or three square roots
 * and the integer powers (negative ones too) from tables built by multiplication: no exp or log.
 * Otherwise each costs one exp(eᵢ·ln x). Either way the result agrees with Math.pow to a few units
 * in the last place.
 */
export class PowerSet {
	/** 1, 2, 4 or 8 when the multiplication route applies, else 0 */
	readonly q: number;
	private readonly e: Float64Array;
	/** offset of x^0 in `ipow`: table index of each exponent's integer part, and q·(its fraction) */
	private readonly ip: Int32Array;
	private readonly fp: Int32Array;
	/** x^(k − zero) for k = 0…length − 1 */
	private readonly ipow: Float64Array;
	private readonly zero: number;
	/** (x^(1/q))^j for j = 0…q − 1 */
	private readonly fpow: Float64Array;

	constructor(e: readonly number[] | Float64Array) {
		this.e = Float64Array.from(e);
		let q = 0;
		for (const cand of [1, 2, 4, 8]) {
			if (
				this.e.every(
					(x) => Math.abs(x) <= 1024 && Math.abs(x * cand - Math.round(x * cand)) < 1e-12
				)
			) {
				q = cand;
				break;
			}
		}
		this.q = q;
		const qq = q || 1;
		const whole = Array.from(this.e, (x) => (q ? Math.floor(Math.round(x * qq) / qq) : 0));
		this.zero = -Math.min(0, ...whole);
		this.ip = Int32Array.from(whole, (k) => k + this.zero);
		this.fp = Int32Array.from(this.e, (x, i) => (q ? Math.round(x * qq) - qq * whole[i] : 0));
		this.ipow = new Float64Array(this.zero + Math.max(0, ...whole) + 1);
		this.fpow = new Float64Array(qq);
	}

	/** out[i] = x^eᵢ (x > 0; lnX = ln x, read only when q = 0) */
	fill(x: number, lnX: number, out: Float64Array): void {
		const { e, ip, fp, ipow, fpow, q, zero } = this;
		if (q === 0) {
			for (let i = 0; i < e.length; i++) out[i] = Math.exp(e[i] * lnX);
			return;
		}
		// x^k by squaring where it can (a short chain of dependent multiplications), 1/x^k likewise
		ipow[zero] = 1;
		const up = ipow.length - zero;
		if (up > 1) ipow[zero + 1] = x;
		for (let k = 2; k < up; k++)
			ipow[zero + k] =
				k & 1 ? ipow[zero + k - 1] * x : ipow[zero + (k >> 1)] * ipow[zero + (k >> 1)];
		if (zero > 0) {
			const inv = 1 / x;
			ipow[zero - 1] = inv;
			for (let k = 2; k <= zero; k++)
				ipow[zero - k] =
					k & 1 ? ipow[zero - k + 1] * inv : ipow[zero - (k >> 1)] * ipow[zero - (k >> 1)];
		}
		if (q === 1) {
			for (let i = 0; i < e.length; i++) out[i] = ipow[ip[i]];
			return;
		}
		let root = Math.sqrt(x);
		if (q >= 4) root = Math.sqrt(root);
		if (q === 8) root = Math.sqrt(root);
		fpow[0] = 1;
		for (let j = 1; j < q; j++) fpow[j] = fpow[j - 1] * root;
		for (let i = 0; i < e.length; i++) out[i] = ipow[ip[i]] * fpow[fp[i]];
	}
}

/** A compiled term of α⁰ or αʳ: adds its value and derivatives (scaled, see AlphaRecord) into `rec`. */
export interface TermEvaluator {
	readonly kind: string;
	/** largest integer δ exponent it reads from the context's table */
	readonly maxD: number;
	/** largest integer τ exponent it reads from the context's table */
	readonly maxT: number;
	add(ctx: EvalContext, order: DerivativeOrder, rec: AlphaRecord): void;
}
