/**
 * A leg "to saturation": it ends where its process first meets the saturated-liquid or the
 * saturated-vapor line (an isochoric heat-up to the dome, an isobaric leg to the bubble or dew
 * point). The engine's target is then x = 0 or x = 1; which one is decided here, from the leg's
 * start, and the sheet marks the leg `to: 'saturation'` so it shows as such.
 *
 * Rule: each line the process can reach is tried. A candidate whose leg passes the other line on
 * the way does not count (that line is met first). Of two left (from inside the dome, one each
 * way), the heating one (q > 0 per kg) is taken — a heat-up is what a vessel's "to saturation"
 * means — else the one nearer in v. Client-safe: the engine is passed in.
 */
import type { Leg, LegSpec, Process, State } from '$lib/thermo/types';

export interface LegEngine {
	computeLeg(spec: LegSpec): Leg;
}

export type SaturationTarget = { ok: true; x: 0 | 1; leg: Leg } | { ok: false; message: string };

export function saturationTarget(
	engine: LegEngine,
	fluid: string,
	start: State,
	process: Process,
	n?: number
): SaturationTarget {
	const tried: { x: 0 | 1; leg: Leg }[] = [];
	const reasons: string[] = [];
	for (const x of [0, 1] as const) {
		if (start.x === x) continue; // already on that line
		try {
			const leg = engine.computeLeg({
				fluid,
				start: { T: start.T, v: start.v },
				process,
				target: { x },
				...(n !== undefined ? { n } : {})
			});
			tried.push({ x, leg });
		} catch (e) {
			reasons.push((e as Error).message);
		}
	}
	const line = (x: 0 | 1) => (x === 0 ? 'saturated-liquid' : 'saturated-vapor');
	// a leg that meets the other line before its end reaches that line first
	const first = tried.filter(
		(c) =>
			!c.leg.crossings.some(
				(k) =>
					k.line === line(c.x === 0 ? 1 : 0) &&
					!sameState(k.state, c.leg.end) &&
					!sameState(k.state, c.leg.start)
			)
	);
	const pool = first.length ? first : tried;
	if (pool.length === 0)
		return {
			ok: false,
			message: `This ${process} leg never reaches the saturation line from its start${reasons.length ? ` (${reasons[0]})` : ''}. Give it another target.`
		};
	if (pool.length === 1) return { ok: true, ...pool[0] };
	const heating = pool.filter((c) => c.leg.q > 0);
	if (heating.length === 1) return { ok: true, ...heating[0] };
	const dv = (c: { leg: Leg }) => Math.abs(Math.log(c.leg.end.v / c.leg.start.v));
	const best = pool.reduce((a, b) => (dv(b) < dv(a) ? b : a));
	return { ok: true, ...best };
}

function sameState(a: State, b: State): boolean {
	return Math.abs(a.T - b.T) <= 1e-6 * b.T && Math.abs(a.v - b.v) <= 1e-6 * b.v;
}
