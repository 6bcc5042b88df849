import type { MeasuredTrace } from '../charts/types';
import type { TracePoint } from './types';

/**
 * A stored trace as the chart draws it: points with a v (fixed, logged or estimated), in-dome
 * points flagged so they show as open circles. Client-safe (no engine, no CSV reader).
 */
export function chartTrace(trace: { id: string; name: string; points: readonly TracePoint[] }): MeasuredTrace {
	return {
		id: trace.id,
		label: trace.name,
		points: trace.points.map((p) => ({ T: p.T, P: p.P, v: p.v, inDome: p.inDome }))
	};
}
