import { fixState, getFluid, saturationAtP, ThermoError } from '../thermo/index';
import type { RawTracePoint, RejectedLine, TracePoint } from './types';

/**
 * How close (K) a logged temperature must be to the saturation temperature at the logged pressure
 * for the pair to count as "on the saturation line". 0.5 K: about what a class A resistance
 * thermometer (±(0.15 + 0.002·|t|) K, IEC 60751) and a 0.25 %-of-span pressure transmitter add up
 * to near 100–200 °C — common practice, not a published figure. Adjustable per upload.
 */
export const DEFAULT_SATURATION_TOLERANCE = 0.5;
export const MAX_SATURATION_TOLERANCE = 5;

export interface FixOptions {
	/** K; see DEFAULT_SATURATION_TOLERANCE */
	toleranceK?: number;
}

/**
 * Fixes each logged point with the engine.
 *
 * A pure fluid's P and T fix its state only off the saturation line: on it, liquid, mixture and
 * vapor share the same P and T. So for each point with triple-point pressure ≤ P < Pc the
 * saturation temperature Tsat(P) is found (equal P and Gibbs energy of both phases); when
 * |T − Tsat| ≤ tolerance the pair is flagged `inDome` and its state is left open, unless the logger
 * also gave v (then the state is fixed from (P, v), with its quality). Otherwise the state is fixed
 * from (T, P) and v comes from the engine. A flagged point without a logged v is placed for drawing
 * at a v interpolated in time between the nearest placed neighbours and clamped to [v′, v″] at its
 * pressure (`vFrom: 'estimated'`): an estimate for the picture, never a property.
 * Points the engine cannot fix (below the triple point, beyond the formulation's range) are returned
 * as rejected lines with the engine's reason.
 */
export function fixTracePoints(fluid: string, raw: readonly RawTracePoint[], options: FixOptions = {}): { points: TracePoint[]; rejected: RejectedLine[] } {
	const tol = options.toleranceK ?? DEFAULT_SATURATION_TOLERANCE;
	const info = getFluid(fluid);
	const points: TracePoint[] = [];
	const rejected: RejectedLine[] = [];
	const bounds = new Map<number, [number, number]>();

	for (const r of raw) {
		try {
			let dTsat: number | null = null;
			let sat: { vl: number; vv: number } | null = null;
			if (r.P >= info.triple.P && r.P < info.critical.P) {
				const s = saturationAtP(fluid, r.P);
				dTsat = r.T - s.T;
				sat = { vl: s.liquid.v, vv: s.vapor.v };
			}
			if (dTsat !== null && sat && Math.abs(dTsat) <= tol) {
				if (r.v !== null) {
					const st = fixState(fluid, { P: r.P, v: r.v });
					points.push({ line: r.line, t: r.t, P: r.P, T: r.T, vLogged: r.v, v: r.v, vFrom: 'logged', phase: st.phase, x: st.x, inDome: true, dTsat });
				} else {
					bounds.set(points.length, [sat.vl, sat.vv]);
					points.push({ line: r.line, t: r.t, P: r.P, T: r.T, vLogged: null, v: null, vFrom: null, phase: null, x: null, inDome: true, dTsat });
				}
				continue;
			}
			const st = fixState(fluid, { T: r.T, P: r.P });
			points.push({ line: r.line, t: r.t, P: r.P, T: r.T, vLogged: r.v, v: st.v, vFrom: 'P-T', phase: st.phase, x: st.x, inDome: false, dTsat });
		} catch (e) {
			if (!(e instanceof ThermoError)) throw e;
			rejected.push({ line: r.line, reason: `${info.name} cannot be fixed there: ${e.message}`, text: r.text });
		}
	}

	// place flagged points without a logged v between their placed neighbours, for drawing only
	for (const [i, [vl, vv]] of bounds) {
		let before: TracePoint | undefined;
		let after: TracePoint | undefined;
		for (let j = i - 1; j >= 0 && !before; j--) if (points[j].v !== null && points[j].vFrom !== 'estimated') before = points[j];
		for (let j = i + 1; j < points.length && !after; j++) if (points[j].v !== null && points[j].vFrom !== 'estimated' && !bounds.has(j)) after = points[j];
		let v: number | null = null;
		const p = points[i];
		if (before && after) {
			const span = after.t - before.t;
			// interpolate in log v: the chart's v axis is logarithmic
			const f = span > 0 ? (p.t - before.t) / span : 0.5;
			v = Math.exp(Math.log(before.v!) + f * (Math.log(after.v!) - Math.log(before.v!)));
		} else if (before || after) v = (before ?? after)!.v;
		if (v !== null) {
			p.v = Math.min(vv, Math.max(vl, v));
			p.vFrom = 'estimated';
		}
	}
	return { points, rejected };
}
