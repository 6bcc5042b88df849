/**
 * Background isolines for the chart: isobars, isotherms and isochores across the drawable range
 * (Tmin…Tmax, triple-point pressure / 10 … Pmax), built on the same curves as the legs (leg-curve.ts)
 * so they pass exactly through the saturation lines and run flat across the dome where they should.
 */
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { getCompiledFluid } from '../registry.ts';
import type { Inputs, Isoline, IsolineKind, State } from '../types.ts';
import { Curve, cptOfState, paramOf, type CPt, type Invariant } from './leg-curve.ts';
import { fixStateOf } from './fix-state.ts';
import { samplePieces, type Piece } from './leg-points.ts';
import { triplePressure } from './saturation.ts';

export const ISOLINE_KINDS: readonly IsolineKind[] = ['isobar', 'isotherm', 'isochore'];
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
	const tries: Inputs[] =
		kind === 'isobar'
			? [{ T: fl.Tmax, P: value }]
			: kind === 'isotherm'
				? [
						{ T: value, P: isolineFloor(fl) },
						{ T: value, P: fl.Pmax }
					]
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
				: { process: 'isochoric', rho: 1 / value };
	const curve = new Curve(fl, inv, startC, isolineFloor(fl));
	curve.energies = false;
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
	return { kind, value, points: pts.map((p) => ({ T: p.c.T, P: p.c.P, v: 1 / p.c.rho })) };
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
	const unit = kind === 'isobar' ? 'Pa' : kind === 'isotherm' ? 'K' : 'm³/kg';
	for (const v of values) {
		if (typeof v !== 'number' || !Number.isFinite(v) || !(v > 0))
			throw new ThermoError(
				'non-positive-input',
				`Isoline values must be positive numbers in ${unit} (got ${String(v)}).`,
				`Give ${kind} values in ${unit}.`
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
	return values.map((v) => isolineOf(fl, kind, v, points));
}
