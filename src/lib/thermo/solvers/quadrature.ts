/**
 * Adaptive Gauss–Kronrod quadrature (7-point Gauss, 15-point Kronrod), used for the leg integrals
 * w = ∫P dv and wShaft = −∫v dP on each smooth piece of a leg. Nodes and weights: Piessens et al.,
 * QUADPACK (1983), routine QK15. The Kronrod rule is exact for polynomials of degree 22, the embedded
 * Gauss rule for degree 13; their difference estimates the error, and an interval is halved until the
 * estimate meets the tolerance.
 */

const XGK = [
	0.991455371120812639206854697526329, 0.949107912342758524526189684047851,
	0.864864423359769072789712788640926, 0.741531185599394439863864773280788,
	0.586087235467691130294144845693013, 0.405845151377397166906606412076961,
	0.207784955007898467600689403773245, 0
];
const WGK = [
	0.02293532201052922496373200805897, 0.063092092629978553290700663189204,
	0.104790010322250183839876322541518, 0.140653259715525918745189590510238,
	0.16900472663926790282658342659855, 0.190350578064785409913256402421014,
	0.204432940075298892414161999234649, 0.209482141084727828012999174891714
];
/** Gauss weights for the nodes XGK[1], XGK[3], XGK[5], XGK[7] */
const WG = [
	0.129484966168869693270611432679082, 0.27970539148927666790146777142378,
	0.381830050505118944950369775488975, 0.417959183673469387755102040816327
];

export interface QuadResult {
	value: number;
	/** estimated absolute error */
	error: number;
	/** integrand evaluations */
	evaluations: number;
}

function gk15(f: (t: number) => number, a: number, b: number): [number, number] {
	const c = 0.5 * (a + b);
	const h = 0.5 * (b - a);
	const fc = f(c);
	let k = fc * WGK[7];
	let g = fc * WG[3];
	for (let j = 0; j < 7; j++) {
		const dx = h * XGK[j];
		const f1 = f(c - dx),
			f2 = f(c + dx);
		k += WGK[j] * (f1 + f2);
		if (j % 2 === 1) g += WG[(j - 1) / 2] * (f1 + f2);
	}
	return [k * h, Math.abs((k - g) * h)];
}

/**
 * ∫ f(t) dt from a to b. An interval is accepted when its Gauss–Kronrod error estimate is below
 * its share (by length) of max(absTol, relTol·|∫|); otherwise it is halved, at most `maxDepth`
 * times along a branch and until `maxEvals` evaluations are spent (then the best estimate stands;
 * `error` reports what is left).
 */
export function integrate(
	f: (t: number) => number,
	a: number,
	b: number,
	relTol = 1e-11,
	absTol = 0,
	maxDepth = 16,
	maxEvals = 4000
): QuadResult {
	if (a === b) return { value: 0, error: 0, evaluations: 0 };
	let evaluations = 0;
	const g = (t: number) => {
		evaluations++;
		return f(t);
	};
	const [whole, err0] = gk15(g, a, b);
	const target = Math.max(absTol, relTol * Math.abs(whole));
	const span = Math.abs(b - a);
	const rec = (
		lo: number,
		hi: number,
		value: number,
		error: number,
		depth: number
	): [number, number] => {
		const tol = (target * Math.abs(hi - lo)) / span;
		if (error <= tol || depth >= maxDepth || evaluations + 30 > maxEvals) return [value, error];
		const mid = 0.5 * (lo + hi);
		const [v1, e1] = gk15(g, lo, mid);
		const [v2, e2] = gk15(g, mid, hi);
		const [r1, q1] = rec(lo, mid, v1, e1, depth + 1);
		const [r2, q2] = rec(mid, hi, v2, e2, depth + 1);
		return [r1 + r2, q1 + q2];
	};
	const [value, error] = rec(a, b, whole, err0, 0);
	return { value, error, evaluations };
}
