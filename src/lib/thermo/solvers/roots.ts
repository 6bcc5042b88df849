/**
 * One-dimensional root finding used by the flashes: safeguarded Newton inside a sign-change
 * bracket, and a scan that finds every root on an interval for functions that may turn (a root
 * can hide between two samples only next to a turning point, which the scan looks for through
 * sign changes of the derivative).
 */

/** Value and derivative of a scalar function at z. */
export interface FD {
	f: number;
	df: number;
}
export type ScalarFn = (z: number, out: FD) => void;

/**
 * Root of fn in [a, b] where fa and fb have opposite signs: Newton steps from z0 (default: the
 * secant point), falling back to bisection when a step leaves the bracket. tol is absolute in z.
 */
export function newtonBracket(
	fn: ScalarFn,
	a: number,
	fa: number,
	b: number,
	fb: number,
	tol: number,
	z0?: number
): number {
	if (fa === 0) return a;
	if (fb === 0) return b;
	const out: FD = { f: 0, df: 0 };
	let z =
		z0 !== undefined && z0 > Math.min(a, b) && z0 < Math.max(a, b)
			? z0
			: a - (fa * (b - a)) / (fb - fa);
	if (!(z > Math.min(a, b) && z < Math.max(a, b))) z = 0.5 * (a + b);
	// rtsafe rule (Numerical Recipes): bisect when Newton leaves the bracket or stops halving
	let dxOld = Math.abs(b - a),
		dx = dxOld;
	for (let it = 0; it < 200; it++) {
		fn(z, out);
		const f = out.f;
		if (f === 0) return z;
		if (f < 0 === fa < 0) {
			a = z;
			fa = f;
		} else b = z;
		let next = z - f / out.df;
		const lo = Math.min(a, b),
			hi = Math.max(a, b);
		const slow = Math.abs(next - z) > 0.5 * dxOld;
		dxOld = dx;
		if (!(next > lo && next < hi) || slow) next = 0.5 * (a + b);
		dx = Math.abs(next - z);
		if (Math.abs(next - z) <= tol || hi - lo <= tol) return next;
		z = next;
	}
	return z;
}

/** Extremum of fn (a zero of its derivative) in [a, b] where df changes sign; bisection/secant on df. */
function turningPoint(
	fn: ScalarFn,
	a: number,
	da: number,
	b: number,
	db: number,
	tol: number
): number {
	const out: FD = { f: 0, df: 0 };
	// eslint-disable-next-line no-useless-assignment -- TypeScript wants z set before a loop it cannot see always runs
	let z = 0.5 * (a + b);
	for (let it = 0; it < 100; it++) {
		z = a - (da * (b - a)) / (db - da);
		if (!(z > Math.min(a, b) && z < Math.max(a, b))) z = 0.5 * (a + b);
		fn(z, out);
		if (out.df === 0) return z;
		if (out.df < 0 === da < 0) {
			a = z;
			da = out.df;
		} else {
			b = z;
			db = out.df;
		}
		if (Math.abs(b - a) <= tol) break;
		// keep shrinking from both sides (Illinois-style)
		if (it % 3 === 2) {
			const m = 0.5 * (a + b);
			fn(m, out);
			if (out.df < 0 === da < 0) {
				a = m;
				da = out.df;
			} else {
				b = m;
				db = out.df;
			}
		}
	}
	return 0.5 * (a + b);
}

/**
 * Where fn is defined (finite) at z and not at zOut, the last point towards zOut at which it is
 * still defined, by bisection to tol (fn's domain ends somewhere between the two).
 */
export function domainEdge(fn: ScalarFn, z: number, zOut: number, tol: number): number {
	const out: FD = { f: 0, df: 0 };
	for (let it = 0; it < 200 && Math.abs(zOut - z) > tol; it++) {
		const m = 0.5 * (z + zOut);
		fn(m, out);
		if (Number.isFinite(out.f) && Number.isFinite(out.df)) z = m;
		else zOut = m;
	}
	return z;
}

/** How scanRoots treats the edge of fn's domain inside the interval. */
export interface EdgeScan {
	/** samples between the last defined sample and the edge */
	samples: number;
	/**
	 * the edge between zIn (fn defined) and zOut (not), where fn is still defined, or null when
	 * it cannot say; without it (or on null) the edge is found by bisection (domainEdge)
	 */
	at?: (zIn: number, zOut: number) => number | null;
}

/**
 * Every root of fn on [z0, z1] from n + 1 equally spaced samples: sign changes of f are refined
 * by newtonBracket; where f keeps its sign but its derivative changes sign, the turning point is
 * located and, if f changes sign there, both roots beside it are refined.
 * With edge, fn may be undefined (NaN) on part of the interval: where one sample of a pair is
 * finite and the other is not, the edge of fn's domain between them is located (edge.at, or
 * domainEdge's bisection) and the defined part scanned again with edge.samples samples —
 * otherwise roots between the last defined sample and the domain's edge (two of them, beside a
 * turning point, or one) would be lost with the undefined sample.
 */
export function scanRoots(
	fn: ScalarFn,
	z0: number,
	z1: number,
	n: number,
	tol: number,
	edge?: EdgeScan
): number[] {
	const zs: number[] = [],
		fs: number[] = [],
		ds: number[] = [];
	const out: FD = { f: 0, df: 0 };
	for (let i = 0; i <= n; i++) {
		const z = z0 + ((z1 - z0) * i) / n;
		fn(z, out);
		zs.push(z);
		fs.push(out.f);
		ds.push(out.df);
	}
	const roots: number[] = [];
	const push = (z: number) => {
		if (Number.isFinite(z) && !roots.some((r) => Math.abs(r - z) <= 10 * tol)) roots.push(z);
	};
	for (let i = 0; i < n; i++) {
		const fa = fs[i],
			fb = fs[i + 1],
			a = zs[i],
			b = zs[i + 1];
		if (!Number.isFinite(fa) || !Number.isFinite(fb)) {
			const okA = Number.isFinite(fa) && Number.isFinite(ds[i]),
				okB = Number.isFinite(fb) && Number.isFinite(ds[i + 1]);
			if (edge && edge.samples > 0 && okA !== okB) {
				const from = okA ? a : b,
					to = okA ? b : a;
				const e = edge.at?.(from, to) ?? domainEdge(fn, from, to, tol);
				if (Math.abs(e - from) > tol)
					for (const r of scanRoots(fn, Math.min(from, e), Math.max(from, e), edge.samples, tol))
						push(r);
			}
			continue;
		}
		if (fa === 0) {
			push(a);
			continue;
		}
		if (fa < 0 !== fb < 0 && fb !== 0) {
			// one turning point inside still leaves exactly one root between opposite signs
			push(newtonBracket(fn, a, fa, b, fb, tol));
			continue;
		}
		if (fb === 0) continue;
		// same sign at both ends: look for a turning point that dips across zero
		const da = ds[i],
			db = ds[i + 1];
		if (
			Number.isFinite(da) &&
			Number.isFinite(db) &&
			da < 0 !== db < 0 &&
			(fa > 0 ? da < 0 : da > 0)
		) {
			const m = turningPoint(fn, a, da, b, db, tol);
			fn(m, out);
			const fm = out.f;
			if (fm === 0) push(m);
			else if (fm < 0 !== fa < 0) {
				push(newtonBracket(fn, a, fa, m, fm, tol));
				push(newtonBracket(fn, m, fm, b, fb, tol));
			}
		}
	}
	if (fs[n] === 0) push(zs[n]);
	return roots;
}
