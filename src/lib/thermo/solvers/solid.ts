/**
 * Melting and sublimation curves (data: the fluid file's `solid` block, or fluids/solid-lines.ts)
 * and the refusal of solid states. A state is solid when its temperature lies on a melting piece's
 * range and its pressure is above both the melting pressure there and the triple-point pressure
 * (the equation's own): the fluid phase ends at the melting curve. States below the triple
 * temperature are refused earlier (below-triple-point), so sublimation curves are for drawing.
 */
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { SOLID_LINES } from '../fluids/solid-lines.ts';
import type { SolidLinePiece, SolidLines } from '../fluids/schema.ts';
import type { State } from '../types.ts';
import { fixStateOf } from './fix-state.ts';
import { triplePressure } from './saturation.ts';

/** The fluid's solid lines, if it has any. */
export function solidLines(fl: Fluid): SolidLines | undefined {
	return fl.data.solid ?? SOLID_LINES[fl.id];
}

/** Pressure of one curve piece at T (Pa). */
export function piecePressure(p: SolidLinePiece, T: number): number {
	const th = T / p.Tref;
	let sum = 0;
	switch (p.form) {
		case 'power-sum':
			for (let i = 0; i < p.a.length; i++) sum += p.a[i] * (Math.pow(th, p.b[i]) - 1);
			return p.Pref * (1 + sum);
		case 'delta-power-sum':
			for (let i = 0; i < p.a.length; i++) sum += p.a[i] * Math.pow(th - 1, p.b[i]);
			return p.Pref * (1 + sum);
		case 'exp-sum':
			for (let i = 0; i < p.a.length; i++) sum += p.a[i] * (1 - Math.pow(th, p.b[i]));
			return p.Pref * Math.exp(sum);
		case 'log-theta':
			for (let i = 0; i < p.a.length; i++) sum += p.a[i] * Math.pow(Math.log(th), p.b[i]);
			return p.Pref * sum;
		case 'exp-theta-sum':
			for (let i = 0; i < p.a.length; i++) sum += p.a[i] * Math.pow(th, p.b[i]);
			return p.Pref * Math.exp(sum / th);
		case 'exp-theta-delta':
			for (let i = 0; i < p.a.length; i++) sum += p.a[i] * Math.pow(1 - th, p.b[i]);
			return p.Pref * Math.exp(sum / th);
		case 'simon':
			for (let i = 0; i < p.a.length; i++) sum += p.a[i] * (Math.pow(th, p.b[i]) - 1);
			return p.Pref + sum;
		case 'power-plain':
			for (let i = 0; i < p.a.length; i++) sum += p.a[i] * Math.pow(th, p.b[i]);
			return p.Pref * sum;
	}
}

function pieceAt(pieces: SolidLinePiece[], T: number, T0: number): SolidLinePiece | undefined {
	// at or above the triple temperature the curve bounding fluid states (water: not ice Ih or III)
	let any: SolidLinePiece | undefined;
	for (const p of pieces) {
		if (!(T >= p.Tmin && T <= p.Tmax)) continue;
		if (p.Tmax > T0) return p;
		any ??= p;
	}
	return any;
}

/** Melting pressure (Pa) at T and the solid beyond it, or null where the fluid has no melting curve at T. */
export function meltingAt(fl: Fluid, T: number): { P: number; solid: string } | null {
	const lines = solidLines(fl);
	if (!lines) return null;
	const p = pieceAt(lines.melting.pieces, T, fl.Tt);
	return p ? { P: piecePressure(p, T), solid: p.solid } : null;
}

/** Sublimation pressure (Pa) at T (below the triple point), or null. */
export function sublimationAt(fl: Fluid, T: number): number | null {
	const p = solidLines(fl)?.sublimation?.pieces.find((q) => T >= q.Tmin && T <= q.Tmax);
	return p ? piecePressure(p, T) : null;
}

/** Relative margin above the melting pressure before a state counts as solid (round-off of the curve's inputs). */
const MELT_TOL = 1e-9;

/** Whether (T, P) lies in the solid region (see the module comment). */
interface SolidCache {
	lines: SolidLines | undefined;
	Pt: number;
	/** the last temperature asked and the pressure above which it is solid (Infinity: no curve there) */
	lastT: number;
	lastLimit: number;
}

function cached(fl: Fluid): SolidCache {
	let c = fl.cache.solid as SolidCache | undefined;
	if (!c) {
		c = { lines: solidLines(fl), Pt: triplePressure(fl), lastT: NaN, lastLimit: Infinity };
		fl.cache.solid = c;
	}
	return c;
}

export function isSolid(fl: Fluid, T: number, P: number): boolean {
	const c = cached(fl);
	const { lines, Pt } = c;
	// no curve, or below the triple-point pressure (gas): never solid here
	if (!lines || P <= Pt) return false;
	// solvers and legs ask at one temperature many times: the limit is kept for the last T
	if (T !== c.lastT) {
		const p = pieceAt(lines.melting.pieces, T, fl.Tt);
		c.lastLimit = p ? Math.max(piecePressure(p, T), Pt) * (1 + MELT_TOL) : Infinity;
		c.lastT = T;
	}
	return P > c.lastLimit;
}

export function solidError(fl: Fluid, T: number, P: number, what?: string): ThermoError {
	const m = meltingAt(fl, T);
	const Pm = m ? Math.max(m.P, triplePressure(fl)) : NaN;
	const solid = m?.solid ?? 'solid';
	return new ThermoError(
		'solid-region',
		`${what ? `The ${fl.id} state with ${what}` : `${fl.id} at T = ${fmt(T)} K, P = ${fmt(P, Pm)} Pa`} is solid, not a fluid: at ${fmt(T)} K the liquid freezes (to ${solid}) above ${fmt(Pm, P)} Pa (${solidLines(fl)?.melting.source}). The engine covers fluid states only.`,
		`Give a pressure below ${fmt(Pm, P)} Pa at this temperature, or a higher temperature.`
	);
}

/** Throw solid-region for a state beyond the melting curve. */
export function assertFluid(fl: Fluid, s: State, what?: string): State {
	if (isSolid(fl, s.T, s.P)) throw solidError(fl, s.T, s.P, what);
	return s;
}

/**
 * The liquid along the melting curve, for drawing: `points` states at temperatures from the
 * triple point up to where the melting pressure reaches the formulation's Pmax (or the curve or
 * Tmax ends), each the fluid just below its melting pressure. Empty for a fluid without a curve.
 */
export function meltingLine(fl: Fluid, points: number): State[] {
	const lines = cached(fl).lines;
	if (!lines?.melting.pieces.length) return [];
	// highest temperature with a melting pressure inside the range: bisection on P_m(T) = Pmax
	let lo = fl.Tt,
		hi = fl.Tmax;
	const Pm = (T: number) => meltingAt(fl, T)?.P ?? Infinity;
	if (Pm(hi) <= fl.Pmax) lo = hi;
	else
		for (let k = 0; k < 60; k++) {
			const m = 0.5 * (lo + hi);
			if (Pm(m) <= fl.Pmax) lo = m;
			else hi = m;
		}
	const out: State[] = [];
	const Pt = cached(fl).Pt;
	for (let i = 0; i < points; i++) {
		const T = fl.Tt + ((lo - fl.Tt) * i) / Math.max(1, points - 1);
		const P = Math.max(Pm(T), Pt) * (1 - 1e-9);
		if (!(P > Pt * (1 + 1e-9)) || !Number.isFinite(P)) continue;
		try {
			out.push(fixStateOf(fl, { T, P }));
		} catch {
			// a point the equation cannot place (at its limits) is left out of the drawing
		}
	}
	return out;
}
