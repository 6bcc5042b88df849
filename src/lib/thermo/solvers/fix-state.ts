/**
 * fixState: validate the two inputs and dispatch to the flash named by the pair.
 */
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point } from '../properties.ts';
import { saturatedState } from '../state.ts';
import type { FixOptions, InputName, Inputs, RootHint, State } from '../types.ts';
import { checkOptions, choose, inWindow, outsideWindow, setNear } from './choose.ts';
import { domeRoots, type DomeProp } from './dome.ts';
import { flashTP } from './flash-t-p.ts';
import { flashPRho, flashPY } from './isobar.ts';
import { flashRhoY } from './isochore.ts';
import { flashTY } from './isotherm.ts';
import { locate, placedState } from './locate.ts';
import { flashYY } from './plane.ts';
import { assertInRange, checkP, checkSaturationP, checkT } from './range.ts';
import { satAtP, satAtT } from './saturation.ts';
import { precisionOf } from './precision.ts';
import { assertFluid } from './solid.ts';
import { bandOf, fixOnLine, holdOutsideBand } from '../pseudo-pure.ts';

/** Canonical property keys after v → rho: order used to name pairs. */
export type Key = 'T' | 'P' | 'rho' | 'u' | 'h' | 's' | 'x';

export type Flash = (fl: Fluid, a: number, b: number, options: FixOptions) => State;

const tRho = new Point();

/** (T, ρ): one evaluation of the equation of state, then placed against the dome. */
function flashTRho(fl: Fluid, T: number, rho: number): State {
	evalPoint(fl, T, rho, tRho, 2);
	const loc = locate(fl, tRho);
	const st = placedState(fl, tRho, loc);
	return loc.sat ? st : assertInRange(fl, st);
}

/** (T, x): saturation at T, then the mass-weighted mixture. */
function flashTX(fl: Fluid, T: number, x: number): State {
	if (T > fl.Tc)
		throw new ThermoError(
			'inconsistent-inputs',
			`A quality exists only below the critical temperature of ${fl.id} (${fmt(fl.Tc)} K); T = ${fmt(T)} K is above it.`,
			`Give a temperature below ${fmt(fl.Tc)} K with x, or give the state by two other properties.`
		);
	return saturatedState(fl, satAtT(fl, T), x);
}

/** (P, x): saturation at P, then the mass-weighted mixture. */
function flashPX(fl: Fluid, P: number, x: number): State {
	if (P > fl.Pc)
		throw new ThermoError(
			'inconsistent-inputs',
			`A quality exists only below the critical pressure of ${fl.id} (${fmt(fl.Pc)} Pa); P = ${fmt(P)} Pa is above it.`,
			`Give a pressure below ${fmt(fl.Pc)} Pa with x, or give the state by two other properties.`
		);
	checkSaturationP(fl, P);
	return saturatedState(fl, satAtP(fl, P), x);
}

const DOME_UNIT: Record<DomeProp, string> = { v: 'm³/kg', u: 'J/kg', h: 'J/kg', s: 'J/(kg·K)' };

/** States on or inside the dome with a given quality and one of v, u, h, s (several possible). */
function flashXY(fl: Fluid, x: number, which: DomeProp, y: number, hint?: RootHint): State {
	const what = `x = ${fmt(x)} and ${which} = ${fmt(y)} ${DOME_UNIT[which]}`;
	const found = domeRoots(fl, { x }, which, y).map((r) => saturatedState(fl, r.sat, x));
	return choose(
		fl,
		found,
		hint,
		what,
		() =>
			new ThermoError(
				'inconsistent-inputs',
				`No saturated ${fl.id} state has ${what}: along the saturation curve from the triple point to the critical point that quality never reaches this ${which}.`,
				`Check the value and its units, or give the state by two other properties (for example T or P with x).`
			)
	);
}

/**
 * Flash for each of the 21 pairs, keyed "A,B" in ORDER (T, P, rho, u, h, s, x): along the
 * isotherm (isotherm.ts), the isobar (isobar.ts), the isochore and across the dome (isochore.ts),
 * the saturation curve (flashXY below, dome.ts), or on the (T, ln ρ) plane for two of u, h, s
 * (plane.ts; in dilute vapor (u, h) hardly fixes P: h − u = Pv ≈ RT).
 */
export const FLASHES: Record<string, Flash> = {
	'T,P': (fl, T, P, o) => flashTP(fl, T, P, o.hint),
	'T,rho': (fl, T, rho) => flashTRho(fl, T, rho),
	'T,u': (fl, T, u, o) => flashTY(fl, T, 'u', u, o.hint),
	'T,h': (fl, T, h, o) => flashTY(fl, T, 'h', h, o.hint),
	'T,s': (fl, T, s, o) => flashTY(fl, T, 's', s, o.hint),
	'T,x': (fl, T, x) => flashTX(fl, T, x),
	'P,rho': (fl, P, rho, o) => flashPRho(fl, P, rho, o.hint),
	'P,u': (fl, P, u) => flashPY(fl, P, 'u', u),
	'P,h': (fl, P, h) => flashPY(fl, P, 'h', h),
	'P,s': (fl, P, s) => flashPY(fl, P, 's', s),
	'P,x': (fl, P, x) => flashPX(fl, P, x),
	'rho,u': (fl, rho, u, o) => flashRhoY(fl, rho, 'u', u, o.hint),
	'rho,h': (fl, rho, h, o) => flashRhoY(fl, rho, 'h', h, o.hint),
	'rho,s': (fl, rho, s, o) => flashRhoY(fl, rho, 's', s, o.hint),
	'rho,x': (fl, rho, x, o) => flashXY(fl, x, 'v', 1 / rho, o.hint),
	'u,h': (fl, u, h, o) => flashYY(fl, 'u', u, 'h', h, o.hint),
	'u,s': (fl, u, s, o) => flashYY(fl, 's', s, 'u', u, o.hint),
	'u,x': (fl, u, x, o) => flashXY(fl, x, 'u', u, o.hint),
	'h,s': (fl, h, s, o) => flashYY(fl, 's', s, 'h', h, o.hint),
	'h,x': (fl, h, x, o) => flashXY(fl, x, 'h', h, o.hint),
	's,x': (fl, s, x, o) => flashXY(fl, x, 's', s, o.hint)
};

const KEY_RANK: Record<Key, number> = { T: 0, P: 1, rho: 2, u: 3, h: 4, s: 5, x: 6 };
/** FLASHES by rank pair (7 × 7, row = first key), so dispatch builds no string */
const BY_RANK: Flash[] = [];
for (const [pair, f] of Object.entries(FLASHES)) {
	const [a, b] = pair.split(',') as [Key, Key];
	BY_RANK[KEY_RANK[a] * 7 + KEY_RANK[b]] = f;
}

function unit(k: InputName): string {
	return { T: 'K', P: 'Pa', v: 'm³/kg', rho: 'kg/m³', u: 'J/kg', h: 'J/kg', s: 'J/(kg·K)', x: '' }[
		k
	];
}

/** Parse and check the inputs: exactly two known, finite properties in range. */
/** Rank of an input name in the order T, P, v = rho, u, h, s, x; −1 for anything else (also inherited names such as "toString") */
function rankOf(k: string): number {
	switch (k) {
		case 'T':
			return 0;
		case 'P':
			return 1;
		case 'v':
		case 'rho':
			return 2;
		case 'u':
			return 3;
		case 'h':
			return 4;
		case 's':
			return 5;
		case 'x':
			return 6;
		default:
			return -1;
	}
}

export function parseInputs(fl: Fluid, inputs: Inputs): [Key, number, Key, number] {
	if (typeof inputs !== 'object' || inputs === null)
		throw new ThermoError(
			'wrong-input-count',
			'Inputs must be an object holding two properties.',
			'Give exactly two of T, P, v, rho, u, h, s, x.'
		);
	// one pass over the keys, no allocation on the common path
	let k1: InputName | null = null,
		k2: InputName | null = null,
		count = 0;
	const rec = inputs as Record<string, unknown>;
	for (const k in rec) {
		if (rec[k] === undefined) continue;
		if (rankOf(k) < 0)
			throw new ThermoError(
				'unknown-input',
				`Unknown input "${k}".`,
				'Give exactly two of T, P, v, rho, u, h, s, x (SI units).'
			);
		count++;
		if (count === 1) k1 = k as InputName;
		else if (count === 2) k2 = k as InputName;
	}
	if (count !== 2 || k1 === null || k2 === null) {
		const given = Object.keys(rec).filter((k) => rec[k] !== undefined);
		if (given.includes('v') && given.includes('rho'))
			throw new ThermoError(
				'duplicate-property',
				'v and rho are the same property (rho = 1/v); they cannot fix a state together.',
				'Give one of v or rho together with one of T, P, u, h, s, x.'
			);
		throw new ThermoError(
			'wrong-input-count',
			`A state needs exactly two independent properties; got ${given.length}${given.length ? ` (${given.join(', ')})` : ''}.`,
			'Give exactly two of T, P, v, rho, u, h, s, x.'
		);
	}
	const r1 = rankOf(k1),
		r2 = rankOf(k2);
	if (r1 === r2)
		throw new ThermoError(
			'duplicate-property',
			'v and rho are the same property (rho = 1/v); they cannot fix a state together.',
			'Give one of v or rho together with one of T, P, u, h, s, x.'
		);
	const a = checkValue(fl, k1, rec[k1]);
	const b = checkValue(fl, k2, rec[k2]);
	const ka: Key = k1 === 'v' ? 'rho' : (k1 as Key),
		kb: Key = k2 === 'v' ? 'rho' : (k2 as Key);
	return r1 < r2 ? [ka, a, kb, b] : [kb, b, ka, a];
}

/** A finite number in range for its property (v returned as rho = 1/v). */
function checkValue(fl: Fluid, k: InputName, val: unknown): number {
	if (typeof val !== 'number' || !Number.isFinite(val))
		throw new ThermoError(
			'non-finite-input',
			`${k} must be a finite number (got ${String(val)}).`,
			`Give ${k} as a finite number in ${unit(k) || 'SI units'}.`
		);
	if ((k === 'T' || k === 'P' || k === 'v' || k === 'rho') && !(val > 0))
		throw new ThermoError(
			'non-positive-input',
			`${k} must be positive (got ${fmt(val, 0)}); the engine uses absolute values.`,
			`Give ${k} in ${unit(k)} as a positive absolute value (for example kelvin, not °C; absolute, not gauge pressure).`
		);
	if (k === 'x' && !(val >= 0 && val <= 1))
		throw new ThermoError(
			'quality-out-of-range',
			`The quality x must lie between 0 and 1 (got ${fmt(val, 0, 1)}).`,
			'Give x as a mass fraction of vapor from 0 (saturated liquid) to 1 (saturated vapor), or give the state by two other properties.'
		);
	if (k === 'T') checkT(fl, val);
	if (k === 'P') checkP(fl, val);
	return k === 'v' ? 1 / val : val;
}

/** Fix a state from two properties (see index.ts fixState). */
export function fixStateOf(fl: Fluid, inputs: Inputs, options: FixOptions = {}): State {
	const near = options.near;
	const win = options.window;
	// nothing to check when no option is given (the common call: no closure built)
	if (near !== undefined || win !== undefined || options.hint !== undefined) checkOptions(options);
	const [ka, a, kb, b] = parseInputs(fl, inputs);
	// a mixture (pseudo-pure.ts): x names its bubble or dew line; other answers are held to its band
	const band = bandOf(fl);
	if (band && kb === 'x') return fixOnLine(fl, band, ka as Exclude<Key, 'x'>, a, b);
	const flash = BY_RANK[KEY_RANK[ka] * 7 + KEY_RANK[kb]];
	// beyond the melting curve the substance is solid: refused (solid.ts), never answered as a fluid
	let st: State;
	if (near === undefined && win === undefined) st = flash(fl, a, b, options);
	else {
		setNear(near, win);
		try {
			st = flash(fl, a, b, options);
		} finally {
			setNear(undefined);
		}
	}
	assertFluid(fl, st);
	if (band) st = holdOutsideBand(fl, band, st);
	// a flash with one answer does not go through choose: the window applies here
	if (win !== undefined && !inWindow(st, win))
		throw outsideWindow(fl, `${ka} = ${fmt(a)} and ${kb} = ${fmt(b)}`, [st], win);
	st.precision = precisionOf(fl, st, ka, a, kb, b);
	return st;
}
