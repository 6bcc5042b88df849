import type { Phase } from '$lib/thermo/types';

/**
 * Measured traces: logger data (time, P, T and optionally v or rho) read from a CSV file and fixed
 * with the engine. Everything stored is SI (s, Pa absolute, K, m³/kg), as the engine speaks.
 * The file convention is documented in README.md beside this file.
 */

/** What a column measures. */
export type TraceColumnKind = 'time' | 'P' | 'T' | 'v' | 'rho';

export interface TraceColumn {
	kind: TraceColumnKind;
	/** 0-based position in the file */
	index: number;
	/** the header cell as written */
	header: string;
	/** unit id from src/lib/units (time: 's', 'min', 'h', 'ms' or 'iso') */
	unit: string;
	/** the unit as the file wrote it */
	unitText: string;
}

/** A line of the file that was not taken, with the reason in words a user can act on. */
export interface RejectedLine {
	/** 1-based line number in the file as an editor shows it */
	line: number;
	reason: string;
	/** the start of the line as written (at most 80 characters) */
	text: string;
}

/** A data line read from the file, converted to SI; not yet fixed with the engine. */
export interface RawTracePoint {
	line: number;
	/** seconds from the first accepted point */
	t: number;
	/** Pa absolute */
	P: number;
	/** K */
	T: number;
	/** m³/kg as logged (from v or 1/rho), or null */
	v: number | null;
	/** the line as written (at most 80 characters), for messages */
	text: string;
}

/** Where a drawn point's specific volume came from. */
export type VolumeSource =
	/** the engine, from the logged P and T (single phase) */
	| 'P-T'
	/** the logger's own v (or rho) column, used where P and T cannot fix the state */
	| 'logged'
	/**
	 * older uploads only: on the saturation line with no logged v, interpolated in time between
	 * neighbours. No longer made, and read back as v open (null) with its `vRange`.
	 */
	| 'estimated';

/** A stored point of a measured trace, SI. */
export interface TracePoint {
	line: number;
	/** seconds from the first point */
	t: number;
	/** Pa absolute, as logged (converted) */
	P: number;
	/** K, as logged (converted) */
	T: number;
	/** m³/kg as logged, or null */
	vLogged: number | null;
	/** m³/kg used to draw the point; null when P and T do not fix it (on the saturation line, no logged v) */
	v: number | null;
	/**
	 * J/kg and J/(kg·K) of the state at (T, v), where v is known: the point's place on the views
	 * without v on an axis (P–h, T–s, h–s). Older uploads lack them; they are filled in on reading.
	 */
	h?: number | null;
	s?: number | null;
	/**
	 * on the saturation line without a logged v: [v′, v″] at the logged pressure, m³/kg. The reading
	 * is somewhere on that segment (saturated liquid, a mixture or saturated vapor); the chart draws
	 * it across the dome there, never at one guessed v.
	 */
	vRange?: [number, number] | null;
	vFrom: VolumeSource | null;
	/** the engine's phase; null for a pair on the saturation line without a logged v */
	phase: Phase | null;
	/** quality where known (a logged v inside the dome) */
	x: number | null;
	/**
	 * the (P, T) pair lies on the saturation line within the tolerance: the fluid there may be
	 * saturated liquid, a mixture or saturated vapor, and P with T alone cannot say which
	 */
	inDome: boolean;
	/** T − Tsat(P), K, where the saturation temperature exists (triple point ≤ P < Pc), else null */
	dTsat: number | null;
}

export type TraceRefusalCode =
	| 'empty'
	| 'too-large'
	| 'too-many-rows'
	| 'not-utf8'
	| 'no-header'
	| 'bad-header'
	| 'unknown-unit'
	| 'pressure-reference'
	| 'rejected-lines'
	| 'no-points';

export interface TraceRefusal {
	ok: false;
	code: TraceRefusalCode;
	/** what was wrong with the file and what to give instead */
	message: string;
	/** rejected lines (at most `MAX_LISTED_REJECTIONS`, in file order) */
	rejected: RejectedLine[];
	/** how many lines were rejected in all */
	rejectedCount: number;
}

export interface TraceReading {
	ok: true;
	columns: TraceColumn[];
	points: TracePoint[];
	/** lines rejected and left out (only when the caller allowed it) */
	rejected: RejectedLine[];
	rejectedCount: number;
	/** remarks about the file that did not stop it (ignored columns, comment lines) */
	notes: string[];
	/** the delimiter the header used */
	delimiter: ',' | ';' | '\t';
	/** the first timestamp as written, when the time column holds ISO 8601 timestamps */
	startedAt: string | null;
	/** how many points lie on the saturation line within the tolerance */
	inDomeCount: number;
}

export type TraceResult = TraceReading | TraceRefusal;
