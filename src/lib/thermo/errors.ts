/**
 * Typed failures of the property engine. Every refusal carries a stable `code` that scripts and
 * the HTTP layer can switch on, a `message` that says what was wrong, and a `hint` that says what
 * to give instead. The engine never answers with NaN or Infinity: it throws one of these.
 */

/** Stable error codes (never renamed; new ones may be added). */
export type ThermoErrorCode =
	/** fluid id or alias not known */
	| 'unknown-fluid'
	/** an input name other than T P v rho u h s x */
	| 'unknown-input'
	/** not exactly two inputs */
	| 'wrong-input-count'
	/** v and rho given together: they are one property */
	| 'duplicate-property'
	/** an input that is not a finite number */
	| 'non-finite-input'
	/** T, P, v or rho zero or negative */
	| 'non-positive-input'
	/** temperature below the triple point, or pressure below the triple-point pressure where only solid or vapor exists */
	| 'below-triple-point'
	/** beyond the melting curve: the substance is solid there (a fluid-only engine refuses it) */
	| 'solid-region'
	/** outside the formulation's range of validity (T above Tmax, P above Pmax, or the state these inputs imply lies outside) */
	| 'out-of-range'
	/** T and P given on the saturation line: they are not independent there */
	| 'two-phase-pressure-temperature'
	/** a state of a pseudo-pure mixture (air) between its bubble and dew lines, where liquid and vapor of different compositions coexist */
	| 'mixture-two-phase'
	/** x outside 0…1 */
	| 'quality-out-of-range'
	/** no fluid state has both inputs (e.g. a quality above the critical temperature) */
	| 'inconsistent-inputs'
	/** every state with these inputs lies outside the requested window (options.window) */
	| 'outside-window'
	/** two states have these inputs; `candidates` names them, `options.hint` chooses */
	| 'ambiguous-state'
	/** an unknown value of an option (e.g. `hint`) */
	| 'invalid-option'
	/** an iteration failed to converge (please report the inputs) */
	| 'no-convergence'
	/** a fluid data file is malformed; `field` names the first bad field */
	| 'invalid-fluid-data'
	/** a part of the contract that is not built yet */
	| 'not-implemented'
	/** a leg's target is never reached along the leg; the message states the reachable range */
	| 'unreachable-target'
	/** a leg's target names the leg's own invariant (an isobaric leg cannot end on a P) */
	| 'target-is-invariant'
	/** a malformed leg spec: unknown process, not exactly one target, polytropic without n, bad samples */
	| 'invalid-leg'
	/** a malformed path spec: system, legs or design limits */
	| 'invalid-path';

/** One of several states that satisfy the same inputs (see `ambiguous-state`). */
export interface StateCandidate {
	/** K */
	T: number;
	/** Pa */
	P: number;
	/** kg/m³ */
	rho: number;
	phase: string;
}

export interface ThermoErrorDetails {
	/** for `invalid-fluid-data`: the path of the first bad field, e.g. `residual[1].t` */
	field?: string;
	/** for `ambiguous-state`: the states that satisfy the inputs */
	candidates?: StateCandidate[];
}

/**
 * Error thrown by every engine entry point for anything it cannot answer.
 * `code` is stable; `message` is for people; `hint` says what to give instead.
 */
export class ThermoError extends Error {
	readonly code: ThermoErrorCode;
	readonly hint: string;
	readonly field?: string;
	readonly candidates?: StateCandidate[];

	constructor(code: ThermoErrorCode, message: string, hint = '', details: ThermoErrorDetails = {}) {
		super(message);
		this.name = 'ThermoError';
		this.code = code;
		this.hint = hint;
		if (details.field !== undefined) this.field = details.field;
		if (details.candidates !== undefined) this.candidates = details.candidates;
	}

	/** Plain JSON shape for the HTTP layer: `{ code, message, hint, field?, candidates? }`. */
	toJSON(): {
		code: ThermoErrorCode;
		message: string;
		hint: string;
		field?: string;
		candidates?: StateCandidate[];
	} {
		const out: {
			code: ThermoErrorCode;
			message: string;
			hint: string;
			field?: string;
			candidates?: StateCandidate[];
		} = {
			code: this.code,
			message: this.message,
			hint: this.hint
		};
		if (this.field !== undefined) out.field = this.field;
		if (this.candidates !== undefined) out.candidates = this.candidates;
		return out;
	}
}

/**
 * Numbers for messages, the one formatter of the engine: 6 significant digits (101325 Pa stays
 * 101325), exponent form outside 1e−3…1e6 — and as many more digits (up to the 17 that identify
 * a double) as it takes to print x differently from each number in `distinctFrom` that differs
 * from it, so a message never contradicts itself ("x must lie between 0 and 1 (got 1)").
 */
export function fmt(x: number, ...distinctFrom: number[]): string {
	if (!Number.isFinite(x)) return String(x);
	for (let digits = 6; ; digits++) {
		const s = fmtDigits(x, digits);
		if (digits >= 17 || !distinctFrom.some((y) => y !== x && fmtDigits(y, digits) === s)) return s;
	}
}

function fmtDigits(x: number, digits: number): string {
	if (!Number.isFinite(x)) return String(x);
	const a = Math.abs(x);
	if (a !== 0 && (a >= 1e6 || a < 1e-3)) return x.toExponential(digits - 1).replace(/\.?0+e/, 'e');
	return Number(x.toPrecision(digits)).toString();
}
