/**
 * From a pointer on the chart to a leg's target. A leg's end can only sit on its process's
 * constraint line through the leg's start (constant P, v, T, s, h, or P·vⁿ); the pointer is
 * projected onto that line — the point of the line nearest to it on screen — and the point's
 * property of the leg's target kind becomes the new target. Pure: the engine comes in as `fix`.
 */
import type { ChartCoords, ChartKind, PressureScale } from '$lib/charts/types';
import { axisScaleType, VIEWS, type ViewProp } from '$lib/charts/views';
import type { Inputs, Process, State, TargetName } from '$lib/thermo/types';
import { INVARIANT, type EditableProp } from '$lib/sheets/doc';

/** Fix a state from two properties (the engine's fixState); throws where there is none. */
export type FixFn = (inputs: Inputs) => State;

/** How the chart maps data to screen, for "nearest on screen": spans of the visible window and its aspect. */
export interface ScreenMetric {
	kind: ChartKind;
	pressureScale: PressureScale;
	/** the y span of the window, SI (K on T–v, Pa on P–v and P–h, J/kg on h–s) */
	ySpan: [number, number];
	/** the x span of the window, SI (m³/kg on T–v and P–v, J/kg on P–h, J/(kg·K) on T–s and h–s) */
	vSpan: [number, number];
	/** plot width / plot height in px */
	aspect: number;
}

/** Where a value sits across a span, 0…1, on a log or linear axis. */
function across(type: 'log' | 'linear', q: number, span: [number, number]): number {
	return type === 'log'
		? Math.log10(q / span[0]) / (Math.log10(span[1] / span[0]) || 1)
		: (q - span[0]) / (span[1] - span[0] || 1);
}

/** Screen-like coordinates (plot heights) of a point given by the view's x and y properties. */
function screen(m: ScreenMetric, xq: number, yq: number): [number, number] {
	const view = VIEWS[m.kind];
	return [
		across(axisScaleType(view.x, m.pressureScale), xq, m.vSpan) * m.aspect,
		across(axisScaleType(view.y, m.pressureScale), yq, m.ySpan)
	];
}

const prop = (c: { [K in ViewProp]?: number }, k: ViewProp): number => c[k] ?? NaN;

/** The state on the constraint line of `process` through `from` at specific volume `v`. */
export function stateAtV(
	process: Exclude<Process, 'isochoric'>,
	from: State,
	v: number,
	fix: FixFn,
	n?: number
): State {
	switch (process) {
		case 'isobaric':
			return fix({ P: from.P, v });
		case 'isothermal':
			return fix({ T: from.T, v });
		case 'isentropic':
			return fix({ s: from.s, v });
		case 'isenthalpic':
			return fix({ h: from.h, v });
		case 'polytropic': {
			const k = n ?? 1;
			return fix({ P: from.P * Math.pow(from.v / v, k), v });
		}
	}
}

function tryState(f: () => State): State | null {
	try {
		const s = f();
		return Number.isFinite(s.T) && Number.isFinite(s.P) && Number.isFinite(s.v) ? s : null;
	} catch {
		return null;
	}
}

/**
 * The point of the leg's constraint line nearest to the pointer on screen. Isochoric lines are
 * vertical, so the pointer's T (or P) is the answer; the others are followed in v: sampled over
 * a window of v around the pointer and refined by golden-section search. Null when the line has
 * no valid state near the pointer.
 */
export function projectOntoLeg(
	process: Process,
	from: State,
	coords: ChartCoords,
	metric: ScreenMetric,
	fix: FixFn,
	n?: number,
	hint?: number
): State | null {
	const view = VIEWS[metric.kind];
	const [xp, yp] = view.pair;
	if (process === 'isochoric') {
		// v is fixed: the pointer's y property (T, P or h) is the other of the pair
		return tryState(() => fix({ [yp]: prop(coords, yp), v: from.v } as Inputs));
	}
	const target = screen(metric, prop(coords, xp), prop(coords, yp));
	const dist = (s: State) => {
		const p = screen(metric, s[xp], s[yp]);
		return Math.hypot(p[0] - target[0], p[1] - target[1]);
	};
	const at = (lv: number) => tryState(() => stateAtV(process, from, 10 ** lv, fix, n));
	// The line is followed in v on every view. Sample a window of v around the pointer (and the
	// previous answer while dragging: the nearest point moves little between two pointer moves),
	// then refine the best bracket. Off the v views the pointer's own v comes from its pair.
	const pointerV =
		coords.v ??
		tryState(() => fix({ [xp]: prop(coords, xp), [yp]: prop(coords, yp) } as Inputs))?.v;
	const near = hint !== undefined && hint > 0 ? hint : (pointerV ?? from.v);
	const here = pointerV ?? near;
	const width = hint !== undefined ? 0.25 : 0.8;
	const lo = Math.min(Math.log10(here), Math.log10(near)) - width;
	const hi = Math.max(Math.log10(here), Math.log10(near)) + width;
	const N = Math.min(40, Math.max(8, Math.ceil((hi - lo) / 0.05)));
	let best: { lv: number; s: State; d: number } | null = null;
	for (let i = 0; i <= N; i++) {
		const lv = lo + ((hi - lo) * i) / N;
		const s = at(lv);
		if (!s) continue;
		const d = dist(s);
		if (!best || d < best.d) best = { lv, s, d };
	}
	if (!best) return null;
	// golden-section search between the neighbours of the best grid point, to 2e-5 decades in v
	const step = (hi - lo) / N;
	let a = best.lv - step;
	let b = best.lv + step;
	const g = (Math.sqrt(5) - 1) / 2;
	const score = (lv: number) => {
		const s = at(lv);
		return s ? { s, d: dist(s) } : null;
	};
	let c = b - g * (b - a);
	let d = a + g * (b - a);
	let fc = score(c);
	let fd = score(d);
	while (b - a > 2e-5) {
		if ((fc?.d ?? Infinity) < (fd?.d ?? Infinity)) {
			b = d;
			d = c;
			fd = fc;
			c = b - g * (b - a);
			fc = score(c);
		} else {
			a = c;
			c = d;
			fc = fd;
			d = a + g * (b - a);
			fd = score(d);
		}
	}
	const refined = [fc, fd]
		.filter((x): x is { s: State; d: number } => x !== null)
		.sort((x, y) => x.d - y.d)[0];
	return refined && refined.d <= best.d ? refined.s : best.s;
}

function inDome(s: State): boolean {
	return s.x !== null && s.x > 1e-9 && s.x < 1 - 1e-9;
}

/**
 * The property a new leg ends on when it is drawn with the pointer: what an engineer would
 * type. Isochoric legs end on T (T–v) or P (P–v); isobaric on T, isothermal on P — or on the
 * quality where the end lies in the dome (T and P are flat there); isentropic, isenthalpic and
 * polytropic legs on the pressure they compress or expand to (v for a polytropic n = 0).
 */
export function defaultTargetKind(
	process: Process,
	end: State,
	kind: ChartKind,
	n?: number
): EditableProp {
	switch (process) {
		case 'isochoric':
			return VIEWS[kind].pair.includes('T') ? 'T' : 'P';
		case 'isobaric':
			return inDome(end) ? 'x' : 'T';
		case 'isothermal':
			return inDome(end) ? 'x' : 'P';
		case 'polytropic':
			return n === 0 ? 'v' : 'P';
		default:
			return 'P';
	}
}

/** A property of a state as a target value (null where it has none: x outside the dome). */
export function valueOf(s: State, prop: EditableProp): number | null {
	if (prop === 'x') return s.x;
	return s[prop];
}

export interface TargetChoice {
	target: Partial<Record<TargetName, number>>;
	/** set when the wanted kind could not hold this end and another was used */
	note: string | null;
}

/**
 * The target for a leg ending at `end`, in the kind `wanted` where it can hold it: not the
 * process's invariant, x only inside or on the dome, and T on an isobaric (P on an isothermal)
 * leg not inside the dome, where it is flat and the leg would stop at the first saturation line.
 * Otherwise the process's default kind at that end, and a note saying so.
 */
export function targetFor(
	process: Process,
	end: State,
	wanted: EditableProp,
	kind: ChartKind,
	n?: number
): TargetChoice {
	const flat =
		(process === 'isobaric' && wanted === 'T') || (process === 'isothermal' && wanted === 'P');
	const ok =
		wanted !== INVARIANT[process] && valueOf(end, wanted) !== null && !(flat && inDome(end));
	if (ok) return { target: { [wanted]: valueOf(end, wanted)! }, note: null };
	let fallback = defaultTargetKind(process, end, kind, n);
	if (valueOf(end, fallback) === null || fallback === INVARIANT[process])
		fallback = process === 'isochoric' ? (VIEWS[kind].pair.includes('T') ? 'T' : 'P') : 'v';
	const why =
		wanted === 'x'
			? 'this end lies outside the vapor dome, where there is no quality'
			: flat
				? `${wanted} does not change across the dome on an ${process} leg`
				: `an ${process} leg keeps ${wanted} constant`;
	return {
		target: { [fallback]: valueOf(end, fallback)! },
		note: `Ends on ${fallback} here: ${why}.`
	};
}
