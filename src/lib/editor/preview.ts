/**
 * The drag preview: while a state is dragged, the browser's own engine recomputes the legs the
 * move changes (and their end states) so the chart can redraw within the frame, before the
 * server answers. A preview is for drawing only: it is never a document's result, never saved,
 * and the server's answer replaces it (state.svelte.ts). Pure: the engine is passed in, so this
 * module does not pull the engine into the page's first load.
 */
import type { ChartLeg, ChartState } from '$lib/charts/types';
import { stateKey, stateLabel, type PathView } from '$lib/sheets/doc';
import type { SheetPathSpec } from '$lib/sheets/types';
import type { FixOptions, Inputs, Leg, LegSpec, State } from '$lib/thermo/types';

/** The engine calls a preview needs (from `$lib/thermo`, loaded lazily in the browser). */
export interface PreviewEngine {
	fixState(fluid: string, inputs: Inputs, options?: FixOptions): State;
	computeLeg(spec: LegSpec): Leg;
}

/** Chart marks computed in the browser for a dragged document. */
export interface PathPreview {
	states: ChartState[];
	legs: ChartLeg[];
	/**
	 * The legs after `states[states.length - 1]` were left out: the time for one frame ran out
	 * (a long path dragged near its start). The server's answer draws them.
	 */
	partial: boolean;
}

export interface PreviewOptions {
	/** points per leg where the spec names none (the editor asks the server for the same) */
	samples?: number;
	/** stop computing further legs once this many ms have gone (default: no limit) */
	budgetMs?: number;
	now?: () => number;
}

/**
 * Chart marks for `spec`, which differs from the document `base` was computed for only from
 * state `first` on (0: the start itself; i: the end of leg i − 1, a new last leg included).
 * States before `first` and the legs between them are taken from `base`; the start (when
 * `first` is 0), each later leg and its end state are computed as POST /api/v1/paths computes
 * them: each leg from the previous end's (T, ρ), starting exactly at that state, with the
 * spec's window and each leg's end choice. Throws the engine's ThermoError when a leg or the
 * start cannot be computed (the caller keeps its last preview).
 */
export function previewPath(
	engine: PreviewEngine,
	spec: SheetPathSpec,
	base: PathView,
	first: number,
	options: PreviewOptions = {}
): PathPreview {
	const now = options.now ?? (() => performance.now());
	const started = now();
	const legs = spec.legs;
	if (first < 0 || first > legs.length || first > base.states.length)
		throw new RangeError(`state ${first} is not on the path`);
	const states: ChartState[] = base.states.slice(0, Math.max(first, 1)).map((s, i) => ({
		id: stateKey(legs, i),
		label: stateLabel(i),
		state: s.state
	}));
	const chartLegs: ChartLeg[] = base.legs.slice(0, Math.max(first - 1, 0)).map((l) => ({ ...l }));
	if (first === 0)
		states[0] = {
			id: stateKey(legs, 0),
			label: stateLabel(0),
			state: engine.fixState(spec.fluid, spec.start, {
				hint: spec.startHint,
				near: spec.startNear,
				window: spec.window
			})
		};
	// the server's rule (engineSpec + the editor's drag request): a leg's own samples, else the
	// path's, else the editor's drag detail when nothing names any
	const named = spec.samples !== undefined || legs.some((l) => l.samples !== undefined);
	const pathSamples = named ? spec.samples : options.samples;
	const from0 = Math.max(first - 1, 0);
	for (let i = from0; i < legs.length; i++) {
		if (i > from0 && options.budgetMs !== undefined && now() - started > options.budgetMs)
			return { states, legs: chartLegs, partial: true };
		const ls = legs[i];
		const from = states[i].state;
		const leg = engine.computeLeg({
			fluid: spec.fluid,
			start: { T: from.T, rho: from.rho },
			process: ls.process,
			target: ls.target,
			n: ls.n,
			samples: ls.samples ?? pathSamples,
			window: spec.window,
			endHint: ls.endHint,
			endNear: ls.endNear
		});
		const points = leg.points.slice();
		points[0] = from;
		const chartLeg: ChartLeg = {
			id: ls.id,
			process: ls.process,
			points,
			crossings: leg.crossings,
			from: states[i].id,
			to: stateKey(legs, i + 1)
		};
		if (ls.n !== undefined) chartLeg.n = ls.n;
		chartLegs.push(chartLeg);
		states.push({ id: stateKey(legs, i + 1), label: stateLabel(i + 1), state: leg.end });
	}
	return { states, legs: chartLegs, partial: false };
}
