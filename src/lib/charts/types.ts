import type { Crossing, Process, State } from '$lib/thermo/types';
import type { DesignLimits } from '$lib/sheets/frame';

/** Which property diagram (the five views, described as data in views.ts). */
export type { ChartKind } from './views';
export type PressureScale = 'log' | 'linear';

/** Saturation lines as `GET /api/v1/fluids/{id}/saturation` returns them (triple point → critical point). */
export interface SaturationCurve {
	liquid: State[];
	vapor: State[];
	critical: State;
	/** the liquid along the melting curve (drawn where it falls in view); absent or empty without one */
	melting?: State[];
	/** what a chart's description says of this dome beyond its shape (water by IAPWS-IF97: where it stops) */
	note?: string;
}

export interface TriplePoint {
	/** K */
	T: number;
	/** Pa */
	P: number;
}

/** The formulation's valid range (`FluidInfo.limits`), SI. */
export interface FluidRange {
	Tmin: number;
	Tmax: number;
	Pmax: number;
}

/** A point of a background line or limit curve, SI; h and s where the views that need them are drawn. */
export interface CurvePoint {
	T: number;
	P: number;
	v: number;
	h?: number;
	s?: number;
}

export type IsolineKind =
	'isobar' | 'isotherm' | 'isochore' | 'isentrope' | 'isenthalp' | 'quality';

/** A background line of constant P, T, v, s, h or x. `value` is SI (Pa absolute, K, m³/kg, J/(kg·K), J/kg, 1). */
export interface Isoline {
	kind: IsolineKind;
	value: number;
	points: CurvePoint[];
}

/** A state on the path: `label` is what the disc shows (S1, S2, …). */
export interface ChartState {
	id: string;
	label: string;
	state: State;
}

/** A leg of the path between two states (ids of `ChartState`). */
export interface ChartLeg {
	id: string;
	process: Process;
	points: State[];
	crossings: Crossing[];
	from: string;
	to: string;
	/** polytropic exponent, shown in the leg's accessible name */
	n?: number;
}

export interface ChartSelection {
	kind: 'state' | 'leg';
	id: string;
}

export type { DesignLimit, DesignLimits } from '$lib/sheets/frame';
export type DesignLimitName = keyof DesignLimits;

/** A logged point. Only points with `v` can be drawn (the page fills v in with the engine). */
export interface TracePoint {
	T: number;
	P: number;
	v?: number | null;
	/** filled in by the page where it can; a point is drawn on the views whose two properties it has */
	h?: number | null;
	s?: number | null;
	/** the logger or the engine says the point is inside the vapor dome */
	inDome?: boolean;
	/**
	 * P and T on the saturation line without a v: [v′, v″] at that pressure. Drawn as a band across
	 * the dome at its T (T–v) or P (P–v): the reading is somewhere on it, v not determined.
	 */
	vBand?: [number, number] | null;
}

/** Open review notes on a leg or a state, drawn as a numbered flag beside it (review/flags.ts). */
export interface NoteFlag {
	/** "leg:<id>" or "state:<id>" (a state is named by the leg it ends, or `start`) */
	key: string;
	target: { kind: 'leg' | 'state'; id: string };
	count: number;
	/** the anchor's label where it is shown (L2, S3) */
	label: string;
	/** the notes' ids (the page opens them) */
	ids?: string[];
}

export interface MeasuredTrace {
	id: string;
	label: string;
	points: TracePoint[];
	/**
	 * `measured` (default): logger data, a hairline with small crosses, keyed "measured".
	 * `revision`: another revision's computed path (Compare), a wide faint band keyed by its label.
	 */
	kind?: 'measured' | 'revision';
}

/** A position on the chart in SI: the view's two properties (T and v on T–v, P and h on P–h …; P absolute). */
export interface ChartCoords {
	T?: number;
	P?: number;
	v?: number;
	h?: number;
	s?: number;
}

export interface ClampResult {
	coords: ChartCoords;
	/** null when the coordinates were inside the valid range */
	reason: string | null;
}

/** Data-space window in SI: x and y are the view's axis properties (v and T on T–v …). */
export interface Domain {
	x: [number, number];
	y: [number, number];
}

export interface Rect {
	x: number;
	y: number;
	width: number;
	height: number;
}

export interface Point {
	x: number;
	y: number;
}
