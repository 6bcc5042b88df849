/**
 * A seeded round trip over every fluid and input pair with a mix of regions (used by
 * region-mix.test.ts and scripts/region-mix.ts; no test framework here). States are drawn from
 * (T, P) or (T, x) — 40 % single phase over the whole range, 20 % two-phase, 15 % within 1 % of
 * Tc, 12.5 % near the triple point, 12.5 % gas from 1 Pa to the triple-point pressure — skipping
 * solids; each is re-fixed from an input pair and the answer judged:
 *   - a state: T, P and v within max(1e−6, PRECISION_FACTOR × its stated precision) of the reference
 *     (a saturated phase may stand for a single-phase reference closer to the line than the pair resolves);
 *   - ambiguous-state: the reference among the candidates, and every candidate reproducing the inputs;
 *   - any other refusal: a failure.
 */
import { ThermoError } from './errors.ts';
import { fixState, isSolidAt, listFluids, saturationAtT } from './index.ts';
import type { FluidInfo, InputName, Inputs, State } from './types.ts';
import { fluidData } from './fluids/index.ts';

export const PAIR_LIST: [InputName, InputName][] = [];
{
	const names: InputName[] = ['T', 'P', 'v', 'u', 'h', 's', 'x'];
	for (let i = 0; i < names.length; i++)
		for (let j = i + 1; j < names.length; j++) PAIR_LIST.push([names[i], names[j]]);
}

const NO_X_PAIRS = PAIR_LIST.filter(([a, b]) => a !== 'x' && b !== 'x');

/** mulberry32: a small seeded generator (uniform in [0, 1)) */
export function rng(seed: number): () => number {
	let a = seed >>> 0;
	return () => {
		a = (a + 0x6d2b79f5) >>> 0;
		let t = a;
		t = Math.imul(t ^ (t >>> 15), t | 1);
		t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
		return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
	};
}

export type Region = 'single' | 'two-phase' | 'near-critical' | 'near-triple' | 'dilute-gas';

/** Cumulative shares of the regions. */
const MIX: [Region, number][] = [
	['single', 0.4],
	['two-phase', 0.6],
	['near-critical', 0.75],
	['near-triple', 0.875],
	['dilute-gas', 1]
];

function logUniform(r: () => number, lo: number, hi: number): number {
	return Math.exp(Math.log(lo) + r() * (Math.log(hi) - Math.log(lo)));
}

/** One reference state of a region (null when the draw lands on a solid or a refusal; the caller draws again). */
export function drawState(f: FluidInfo, region: Region, r: () => number): State | null {
	const Tt = f.limits.Tmin,
		Tc = f.equationCritical?.T ?? f.critical.T,
		Pt = f.triple.P;
	let inputs: Inputs;
	switch (region) {
		case 'single':
			inputs = { T: Tt + r() * (f.limits.Tmax - Tt), P: logUniform(r, Pt, f.limits.Pmax) };
			break;
		case 'two-phase':
			inputs = { T: Tt + r() * (Tc - Tt) * 0.999, x: r() };
			break;
		case 'near-critical': {
			const T = Tc * (1 + (r() * 2 - 1) * 0.01);
			inputs =
				r() < 0.3 && T < Tc * 0.9999
					? { T, x: r() }
					: { T, P: logUniform(r, 0.5 * f.critical.P, 2 * f.critical.P) };
			break;
		}
		case 'near-triple': {
			const T = Tt * (1 + r() * 0.02);
			inputs = r() < 0.4 ? { T, x: r() } : { T, P: logUniform(r, Pt, f.limits.Pmax) };
			break;
		}
		case 'dilute-gas':
			inputs = { T: Tt + r() * (f.limits.Tmax - Tt), P: logUniform(r, 1, Pt) };
			break;
	}
	if (inputs.P !== undefined && isSolidAt(f.id, inputs.T as number, inputs.P)) return null;
	try {
		return fixState(f.id, inputs);
	} catch {
		return null; // on the saturation line for (T, P), or beyond a limit: draw again
	}
}

export function regionOf(r: () => number): Region {
	const u = r();
	return (MIX.find(([, c]) => u < c) as [Region, number])[0];
}

/** Factor on the stated precision within which an answer counts as the reference. */
export const PRECISION_FACTOR = 8;

function inputsOf(s: State, a: InputName, b: InputName): Inputs {
	const val = (k: InputName) => (k === 'x' ? (s.x as number) : (s[k] as number));
	return { [a]: val(a), [b]: val(b) };
}

/** How far (relative, worst of T, P, v) an answer is from the reference, against the allowed band (≤ 1 passes). */
function miss(got: State, ref: State): number {
	let worst = 0;
	for (const k of ['T', 'P', 'v'] as const) {
		const pr = got.precision?.[k] ?? 0;
		const band = Math.max(1e-6, PRECISION_FACTOR * pr);
		worst = Math.max(worst, Math.abs(got[k] - ref[k]) / Math.abs(ref[k]) / band);
	}
	return worst;
}

/** The inputs reproduced by a candidate, relative (x absolute); u, h, s against max(|value|, R·T·1e−3). */
function inputMiss(st: State, inputs: Inputs, R: number): number {
	let worst = 0;
	for (const [k, want] of Object.entries(inputs) as [InputName, number][]) {
		const got = k === 'x' ? (st.x ?? NaN) : (st[k as 'T'] as number);
		const scale =
			k === 'x'
				? 1
				: k === 'u' || k === 'h'
					? Math.max(Math.abs(want), 1e-3 * R * st.T)
					: k === 's'
						? Math.max(Math.abs(want), 1e-3 * R)
						: Math.abs(want);
		const e = Math.abs(got - want) / scale;
		worst = Math.max(worst, Number.isNaN(e) ? Infinity : e);
	}
	return worst;
}

/** A single-phase reference within the pair's resolution of its saturation line may come back as the saturated phase. */
function lineStandIn(got: State, ref: State): boolean {
	if (got.x === null || ref.x !== null) return false;
	if (!(
		(got.x === 0 && ref.phase === 'compressed-liquid') ||
		(got.x === 1 && ref.phase !== 'compressed-liquid')
	))
		return false;
	const sat = saturationAtT(ref.fluid, ref.T);
	return (
		Math.abs(got.T - ref.T) <= 1e-6 * ref.T &&
		Math.abs(ref.P - sat.P) <= Math.max(1e-6, PRECISION_FACTOR * (got.precision?.P ?? 0)) * ref.P
	);
}

export interface Failure {
	fluid: string;
	region: Region;
	pair: string;
	inputs: Inputs;
	ref: { T: number; P: number; phase: string };
	why: string;
}

/** Re-fix `ref` from pair (a, b) and judge the answer; null when it passes. */
export function check(
	f: FluidInfo,
	region: Region,
	ref: State,
	a: InputName,
	b: InputName
): Failure | null {
	if ((a === 'x' || b === 'x') && ref.x === null) return null;
	const inputs = inputsOf(ref, a, b);
	const fail = (why: string): Failure => ({
		fluid: f.id,
		region,
		pair: `${a},${b}`,
		inputs,
		ref: { T: ref.T, P: ref.P, phase: ref.phase },
		why
	});
	// (T, P) cannot fix a mixture: the true answer is that refusal
	if (a === 'T' && b === 'P' && ref.phase === 'saturated-mixture') {
		try {
			fixState(f.id, inputs);
		} catch (e) {
			if (e instanceof ThermoError && e.code === 'two-phase-pressure-temperature') return null;
		}
		return fail('a mixture from (T, P) was not refused as two-phase-pressure-temperature');
	}
	// specific gas constant from the reference (Z = Pv/(RT)), for the u, h, s floor of inputMiss
	const R = ref.P / (ref.rho * ref.T * (ref.Z ?? 1));
	let got: State;
	try {
		got = fixState(f.id, inputs);
	} catch (e) {
		if (!(e instanceof ThermoError)) return fail(`threw ${(e as Error).message}`);
		if (e.code !== 'ambiguous-state' || !e.candidates) return fail(`${e.code}: ${e.message}`);
		const cands = e.candidates.map((c) => fixState(f.id, inputs, { near: { T: c.T, P: c.P } }));
		for (const c of cands)
			if (inputMiss(c, inputs, R) > 1e-6)
				return fail(
					`candidate at T = ${c.T}, P = ${c.P} misses the inputs by ${inputMiss(c, inputs, R)}`
				);
		if (!cands.some((c) => miss(c, ref) <= 1 || lineStandIn(c, ref)))
			return fail(`reference not among candidates: ${e.message}`);
		return null;
	}
	if (miss(got, ref) <= 1 || lineStandIn(got, ref)) return null;
	return fail(
		`answered ${got.phase} at T = ${got.T}, P = ${got.P} (precision ${JSON.stringify(got.precision)})`
	);
}

/** Run n states per fluid (one random pair each, or every pair with allPairs). */
export function runMix(
	seed: number,
	n: number,
	allPairs = false,
	only?: string
): { tried: number; failures: Failure[] } {
	const failures: Failure[] = [];
	let tried = 0;
	for (const f of listFluids()) {
		if (only && f.id !== only) continue;
		// a mixture's band has no two-phase states to draw from: air is held to it in fluids/air-served.test.ts
		if (fluidData.find((d) => d.id === f.id)?.band) continue;
		const r = rng(seed ^ hash(f.id));
		for (let i = 0; i < n; i++) {
			const region = regionOf(r);
			let ref: State | null = null;
			for (let k = 0; k < 20 && !ref; k++) ref = drawState(f, region, r);
			if (!ref) continue;
			// one pair drawn among those the state has (x only on and inside the dome)
			const valid = ref.x === null ? NO_X_PAIRS : PAIR_LIST;
			const pairs = allPairs ? PAIR_LIST : [valid[Math.floor(r() * valid.length)]];
			for (const [a, b] of pairs) {
				if ((a === 'x' || b === 'x') && ref.x === null) continue;
				tried++;
				const bad = check(f, region, ref, a, b);
				if (bad) failures.push(bad);
			}
		}
	}
	return { tried, failures };
}

function hash(s: string): number {
	let h = 2166136261;
	for (let i = 0; i < s.length; i++) h = Math.imul(h ^ s.charCodeAt(i), 16777619);
	return h >>> 0;
}
