/**
 * Background isolines for the charts: isobars, isotherms, isochores, isentropes and isenthalps
 * across the drawable range (Tmin…Tmax, triple-point pressure / 10 … Pmax), built on the same
 * curves as the legs (leg-curve.ts) so they pass exactly through the saturation lines and run flat
 * across the dome where they should; and lines of constant quality inside the dome, from the
 * triple point to the critical point. Every point carries T, P, v, h and s, so that one line can be
 * drawn on any of the five views.
 */
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { getCompiledFluid } from '../registry.ts';
import type { Inputs, Isoline, IsolineKind, State } from '../types.ts';
import { evalPoint, Point } from '../properties.ts';
import { Curve, cptOfState, paramOf, type CPt, type Invariant } from './leg-curve.ts';
import { fixStateOf } from './fix-state.ts';
import { samplePieces, type Piece } from './leg-points.ts';
import { satAtT, triplePressure } from './saturation.ts';

export const ISOLINE_KINDS: readonly IsolineKind[] = [
	'isobar',
	'isotherm',
	'isochore',
	'isentrope',
	'isenthalp',
	'quality'
];

/** The SI unit of each kind's value, for messages and the API's answer. */
export const ISOLINE_UNITS: Readonly<Record<IsolineKind, string>> = {
	isobar: 'Pa',
	isotherm: 'K',
	isochore: 'm³/kg',
	isentrope: 'J/(kg·K)',
	isenthalp: 'J/kg',
	quality: '1'
};
/** Default, least and greatest number of points per isoline, and most lines per request. */
export const ISOLINE_POINTS_DEFAULT = 100;
export const ISOLINE_POINTS_MIN = 20;
export const ISOLINE_POINTS_MAX = 2000;
export const ISOLINE_VALUES_MAX = 40;

function invalid(message: string, hint: string): ThermoError {
	return new ThermoError('invalid-option', message, hint);
}

/** Lowest pressure an isoline is drawn to: a tenth of the triple-point pressure (at least 1 Pa). */
export function isolineFloor(fl: Fluid): number {
	return Math.max(1, triplePressure(fl) / 10);
}

function startOf(fl: Fluid, kind: IsolineKind, value: number): State {
	// an isentrope or isenthalp is found from a pressure it crosses: try a spread of them
	const pressures = [fl.Pc, 1e5, fl.Pc / 10, fl.Pc * 3, isolineFloor(fl) * 10, fl.Pmax / 10]
		.filter((P) => P >= isolineFloor(fl) && P <= fl.Pmax)
		.sort((a, b) => Math.abs(Math.log(a / fl.Pc)) - Math.abs(Math.log(b / fl.Pc)));
	const tries: Inputs[] =
		kind === 'isobar'
			? [{ T: fl.Tmax, P: value }]
			: kind === 'isotherm'
				? [
						{ T: value, P: isolineFloor(fl) },
						{ T: value, P: fl.Pmax }
					]
				: kind === 'isentrope'
					? pressures.map((P) => ({ P, s: value }))
					: kind === 'isenthalp'
						? pressures.map((P) => ({ P, h: value }))
						: [fl.Tmax, fl.Tc * 1.2, fl.Tc, 0.5 * (fl.Tmin + fl.Tc), fl.Tmin]
								.filter((T) => T <= fl.Tmax)
								.map((T) => ({ T, v: value }));
	let last: unknown = null;
	for (const inputs of tries) {
		try {
			return fixStateOf(fl, inputs);
		} catch (e) {
			last = e;
		}
	}
	if (last instanceof ThermoError) throw last;
	throw new ThermoError(
		'out-of-range',
		`No ${fl.id} state lies on this ${kind}.`,
		'Give a value inside the fluid range.'
	);
}

/** One isoline (see Isoline in types.ts). */
function isolineOf(fl: Fluid, kind: IsolineKind, value: number, points: number): Isoline {
	const start = startOf(fl, kind, value);
	const startC = cptOfState(fl, start);
	const inv: Invariant =
		kind === 'isobar'
			? { process: 'isobaric', P: value }
			: kind === 'isotherm'
				? { process: 'isothermal', T: value }
				: kind === 'isentrope'
					? { process: 'isentropic', s: value }
					: kind === 'isenthalp'
						? { process: 'isenthalpic', h: value }
						: { process: 'isochoric', rho: 1 / value };
	const curve = new Curve(fl, inv, startC, isolineFloor(fl));
	const pieces: Piece[] = [];
	const pos = curve.locateStart(startC);
	curve.segs.forEach((seg, k) => {
		// a point known to lie on this piece: a crossing at one of its ends, or the start
		const ok: [CPt, number] = seg.A
			? [seg.A, seg.ta]
			: seg.B
				? [seg.B, seg.tb]
				: [startC, paramOf(seg.dome ? curve.domeParam : curve.singleParam, startC)];
		if (!seg.A && !seg.B && pos.seg !== k) return;
		const a = curve.end(k, 'A', ok[0], ok[1]);
		const b = curve.end(k, 'B', ok[0], ok[1]);
		if (!a || !b || a.t === b.t) return;
		pieces.push({ seg, from: a.t, to: b.t, A: a.p, B: b.p, lineFrom: seg.lineA });
	});
	if (pieces.length === 0) return { kind, value, points: [] };
	const pts = samplePieces(curve, pieces, points);
	return {
		kind,
		value,
		points: pts.map((p) => ({ T: p.c.T, P: p.c.P, v: 1 / p.c.rho, h: p.c.h, s: p.c.s }))
	};
}

/**
 * The line of quality x inside the dome: the mass-weighted mixture of the saturated phases at
 * each T from the lowest saturation temperature to the critical point, where every quality line
 * meets the others. T is spaced more closely toward the critical point, where the dome turns.
 */
function qualityLineOf(fl: Fluid, x: number, points: number): Isoline {
	const T0 = Math.max(fl.Tmin, fl.Tt);
	const out: Isoline['points'] = [];
	const L = new Point();
	const V = new Point();
	for (let i = 0; i < points; i++) {
		// u = 1 − (1 − i/(n−1))²: even steps in u crowd T near Tc
		const r = 1 - i / (points - 1);
		const T = i === points - 1 ? fl.Tc : T0 + (fl.Tc - T0) * (1 - r * r);
		let sat;
		try {
			sat = satAtT(fl, T);
		} catch {
			continue;
		}
		if (sat.rhoL === sat.rhoV || i === points - 1) {
			const c = evalPoint(fl, fl.Tc, fl.rhoc, L, 1);
			out.push({ T: fl.Tc, P: fl.Pc, v: 1 / fl.rhoc, h: c.h, s: c.s });
			continue;
		}
		const l = evalPoint(fl, sat.T, sat.rhoL, L, 1);
		const g = evalPoint(fl, sat.T, sat.rhoV, V, 1);
		const vL = 1 / sat.rhoL;
		const vV = 1 / sat.rhoV;
		out.push({
			T: sat.T,
			P: sat.P,
			v: vL + x * (vV - vL),
			h: l.h + x * (g.h - l.h),
			s: l.s + x * (g.s - l.s)
		});
	}
	return { kind: 'quality', value: x, points: out };
}

/**
 * Isolines of one kind at the given values (SI: Pa for isobars, K for isotherms, m³/kg for
 * isochores), each with at least `points` points (default 100). Throws ThermoError for a bad kind,
 * count or value.
 */
export function isolines(
	fluid: string,
	kind: IsolineKind,
	values: number[],
	points = ISOLINE_POINTS_DEFAULT
): Isoline[] {
	const fl = getCompiledFluid(fluid);
	if (!ISOLINE_KINDS.includes(kind))
		throw invalid(
			`Unknown isoline kind "${String(kind)}".`,
			`Use one of: ${ISOLINE_KINDS.join(', ')}.`
		);
	if (!Array.isArray(values) || values.length === 0 || values.length > ISOLINE_VALUES_MAX)
		throw invalid(
			`Give from 1 to ${ISOLINE_VALUES_MAX} isoline values (got ${Array.isArray(values) ? values.length : 'none'}).`,
			'Ask for fewer lines per request.'
		);
	if (!Number.isInteger(points) || points < ISOLINE_POINTS_MIN || points > ISOLINE_POINTS_MAX)
		throw invalid(
			`points must be a whole number from ${ISOLINE_POINTS_MIN} to ${ISOLINE_POINTS_MAX} (got ${String(points)}).`,
			`Leave points out for ${ISOLINE_POINTS_DEFAULT}.`
		);
	const unit = ISOLINE_UNITS[kind];
	// entropy and enthalpy are counted from each fluid's reference state: they may be negative
	const signed = kind === 'isentrope' || kind === 'isenthalp';
	for (const v of values) {
		if (typeof v !== 'number' || !Number.isFinite(v) || (!signed && !(v > 0) && kind !== 'quality'))
			throw new ThermoError(
				'non-positive-input',
				`Isoline values must be ${signed ? 'finite' : 'positive'} numbers in ${unit} (got ${String(v)}).`,
				`Give ${kind} values in ${unit}.`
			);
		if (kind === 'quality' && !(v >= 0 && v <= 1))
			throw new ThermoError(
				'out-of-range',
				`A quality line's x must lie from 0 to 1 (got ${fmt(v)}).`,
				'Give qualities such as 0.1, 0.2 … 0.9.'
			);
		if (kind === 'isobar' && v > fl.Pmax)
			throw new ThermoError(
				'out-of-range',
				`P = ${fmt(v, fl.Pmax)} Pa is above the range of ${fl.id} (up to ${fmt(fl.Pmax, v)} Pa).`,
				`Give isobars up to ${fmt(fl.Pmax)} Pa.`
			);
		if (kind === 'isotherm' && (v < fl.Tmin || v > fl.Tmax))
			throw new ThermoError(
				'out-of-range',
				`T = ${fmt(v, fl.Tmin, fl.Tmax)} K is outside the range of ${fl.id} (${fmt(fl.Tmin, v)}–${fmt(fl.Tmax, v)} K).`,
				`Give isotherms from ${fmt(fl.Tmin)} to ${fmt(fl.Tmax)} K.`
			);
	}
	if (kind === 'quality') return values.map((x) => qualityLineOf(fl, x, points));
	return values.map((v) => isolineOf(fl, kind, v, points));
}
