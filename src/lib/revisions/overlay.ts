import type { MeasuredTrace } from '$lib/charts/types';
import type { PathResult } from '$lib/thermo/types';

/**
 * Another revision's path as an overlay on the chart (kind `revision`: a wide faint band keyed by
 * the revision's label, not the measured-trace hairline), so two revisions can be read on one
 * diagram: the compared path in full colour, the other as the band. Every leg's points, in order.
 */
export function pathOverlay(result: PathResult, id: string, label: string): MeasuredTrace {
	const points: MeasuredTrace['points'] = [];
	for (const l of result.legs) {
		for (const p of l.leg.points) {
			const last = points[points.length - 1];
			if (last && last.T === p.T && last.P === p.P && last.v === p.v) continue;
			points.push({ T: p.T, P: p.P, v: p.v, inDome: false });
		}
	}
	if (points.length === 0 && result.states[0]) {
		const s = result.states[0].state;
		points.push({ T: s.T, P: s.P, v: s.v, inDome: false });
	}
	return { id, label, points, kind: 'revision' };
}
