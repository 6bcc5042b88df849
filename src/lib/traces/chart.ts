import type { MeasuredTrace } from '$lib/charts/types';
import type { TracePoint } from './types';

/**
 * A stored trace as the chart draws it: points with a v (from P and T, or logged) on its line;
 * readings on the saturation line without a logged v as a band across the dome from v′ to v″ at
 * their T and P (their v is not determined). Points carry h and s where the server gave them, for
 * the views without v (P–h, T–s, h–s). Client-safe (no engine, no CSV reader).
 */
export function chartTrace(trace: {
	id: string;
	name: string;
	points: readonly TracePoint[];
}): MeasuredTrace {
	return {
		id: trace.id,
		label: trace.name,
		points: trace.points.map((p) =>
			p.vRange && p.vLogged === null
				? { T: p.T, P: p.P, v: null, inDome: true, vBand: p.vRange }
				: p.vFrom === 'estimated'
					? { T: p.T, P: p.P, v: null, inDome: p.inDome }
					: { T: p.T, P: p.P, v: p.v, h: p.h ?? null, s: p.s ?? null, inDome: p.inDome }
		)
	};
}
