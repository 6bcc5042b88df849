import { fixState, getFluid, saturationAtP, ThermoError } from '$lib/thermo';
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
 * from (T, P) and v comes from the engine. A flagged point without a logged v keeps v = null and
 * carries `vRange` = [v′, v″] at its pressure: the measurement puts it on that segment of the
 * isobar across the dome and says nothing more, so nothing more is drawn or assumed.
 * Points the engine cannot fix (below the triple point, beyond the formulation's range) are returned
 * as rejected lines with the engine's reason.
 */
export function fixTracePoints(
	fluid: string,
	raw: readonly RawTracePoint[],
	options: FixOptions = {}
): { points: TracePoint[]; rejected: RejectedLine[] } {
	const tol = options.toleranceK ?? DEFAULT_SATURATION_TOLERANCE;
	const info = getFluid(fluid);
	const points: TracePoint[] = [];
	const rejected: RejectedLine[] = [];

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
					points.push({
						line: r.line,
						t: r.t,
						P: r.P,
						T: r.T,
						vLogged: r.v,
						v: r.v,
						h: st.h,
						s: st.s,
						vFrom: 'logged',
						phase: st.phase,
						x: st.x,
						inDome: true,
						dTsat
					});
				} else
					points.push({
						line: r.line,
						t: r.t,
						P: r.P,
						T: r.T,
						vLogged: null,
						v: null,
						vFrom: null,
						phase: null,
						x: null,
						inDome: true,
						dTsat,
						vRange: [sat.vl, sat.vv]
					});
				continue;
			}
			const st = fixState(fluid, { T: r.T, P: r.P });
			points.push({
				line: r.line,
				t: r.t,
				P: r.P,
				T: r.T,
				vLogged: r.v,
				v: st.v,
				h: st.h,
				s: st.s,
				vFrom: 'P-T',
				phase: st.phase,
				x: st.x,
				inDome: false,
				dTsat
			});
		} catch (e) {
			if (!(e instanceof ThermoError)) throw e;
			rejected.push({
				line: r.line,
				reason: `${info.name} cannot be fixed there: ${e.message}`,
				text: r.text
			});
		}
	}
	return { points, rejected };
}

/**
 * Stored points as they are read back: a saturation-line point without a logged v has v open and
 * its [v′, v″] (older uploads stored an interpolated "estimated" v and no range: both are put right
 * here, so no guessed v is ever drawn); a point with v and without h and s (older uploads) gets
 * them from (T, v), so it has its place on P–h, T–s and h–s too.
 */
export function openSaturationPoints(fluid: string, points: TracePoint[]): TracePoint[] {
	return points.map((p) => {
		if (!p.inDome || p.vLogged !== null || (p.vRange && p.v === null)) return withHS(fluid, p);
		try {
			const s = saturationAtP(fluid, p.P);
			return { ...p, v: null, h: null, s: null, vFrom: null, vRange: [s.liquid.v, s.vapor.v] };
		} catch {
			return { ...p, v: null, h: null, s: null, vFrom: null, vRange: null };
		}
	});
}

function withHS(fluid: string, p: TracePoint): TracePoint {
	if (p.h != null && p.s != null) return p;
	if (!(p.v !== null && p.v > 0) || p.vFrom === 'estimated') return p;
	try {
		const st = fixState(fluid, { T: p.T, v: p.v });
		return { ...p, h: st.h, s: st.s };
	} catch (e) {
		if (!(e instanceof ThermoError)) throw e;
		return p;
	}
}
