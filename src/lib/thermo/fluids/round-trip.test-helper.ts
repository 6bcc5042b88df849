/**
 * Test helper (not engine code): fix a known state again from one pair of its own properties and
 * say how the answer differs. Used by the fluid tests beside this file.
 */
import { fixState } from '../index.ts';
import { ThermoError } from '../errors.ts';
import type { InputName, Inputs, RootHint, State } from '../types.ts';

/** The seven input names; v stands for v and rho (one property). */
export const INPUT_NAMES: InputName[] = ['T', 'P', 'v', 'u', 'h', 's', 'x'];

/** All 21 pairs of INPUT_NAMES. */
export const INPUT_PAIRS: [InputName, InputName][] = [];
for (let i = 0; i < INPUT_NAMES.length; i++)
	for (let j = i + 1; j < INPUT_NAMES.length; j++)
		INPUT_PAIRS.push([INPUT_NAMES[i], INPUT_NAMES[j]]);

const HINTS: RootHint[] = [
	'lower-T',
	'higher-T',
	'lower-P',
	'higher-P',
	'liquid-side',
	'vapor-side'
];

/** The properties a reference state must agree in (x separately). */
export type Reference = Pick<State, 'T' | 'P' | 'v' | 'u' | 'h' | 's' | 'x'>;

/** Relative agreement, with a floor for energies near zero where a relative measure means nothing. */
function close(a: number, b: number, rel: number, floor: number): boolean {
	return Math.abs(a - b) <= rel * Math.max(Math.abs(b), floor);
}

/** null when `got` is `ref` within `rel` (u, h with a 1 kJ/kg floor, s with 10 J/(kg·K)); else what differs. */
export function differs(got: Reference, ref: Reference, rel: number): string | null {
	const checks: [keyof Reference, number][] = [
		['T', 1],
		['P', 1],
		['v', 0],
		['u', 1e3],
		['h', 1e3],
		['s', 10]
	];
	for (const [k, floor] of checks) {
		if (!close(got[k] as number, ref[k] as number, rel, floor))
			return `${k} ${got[k]} vs ${ref[k]}`;
	}
	if ((ref.x === null) !== (got.x === null)) return `x ${got.x} vs ${ref.x}`;
	if (ref.x !== null && Math.abs((got.x as number) - ref.x) > rel) return `x ${got.x} vs ${ref.x}`;
	return null;
}

export interface PairOutcome {
	/** null when the state came back; otherwise why not */
	failure: string | null;
	/** the pair has several states (ambiguous-state) and the reference is named among them */
	ambiguous: boolean;
	/** ambiguous, and no hint returns the reference (a middle one of three or more candidates) */
	unreachable: boolean;
}

/**
 * Fix `ref` again from the pair (a, b). Where the engine answers `ambiguous-state` (which the
 * contract allows), the reference must be one of the named candidates; when a hint returns it, that
 * answer must match too. A reference between two other candidates may be out of every hint's reach
 * (hints pick an extreme in T, P or ρ): it passes as named, flagged `unreachable`.
 */
export function fixFromPair(
	fluid: string,
	ref: Reference,
	[a, b]: [InputName, InputName],
	rel: number
): PairOutcome {
	const value = (k: InputName): number => (k === 'rho' ? 1 / ref.v : (ref[k] as number));
	const inputs: Inputs = { [a]: value(a), [b]: value(b) };
	const judge = (got: State): string | null => differs(got, ref, rel);
	try {
		return { failure: judge(fixState(fluid, inputs)), ambiguous: false, unreachable: false };
	} catch (e) {
		if (!(e instanceof ThermoError)) throw e;
		if (e.code !== 'ambiguous-state')
			return { failure: `${e.code}: ${e.message}`, ambiguous: false, unreachable: false };
		const listed = (e.candidates ?? []).some(
			(c) =>
				Math.abs(c.T - ref.T) <= rel * ref.T && Math.abs(c.rho * ref.v - 1) <= Math.max(rel, 1e-6)
		);
		if (!listed)
			return {
				failure: `ambiguous, reference not among ${JSON.stringify(e.candidates)}`,
				ambiguous: true,
				unreachable: false
			};
		for (const hint of HINTS) {
			try {
				if (judge(fixState(fluid, inputs, { hint })) === null)
					return { failure: null, ambiguous: true, unreachable: false };
			} catch (err) {
				if (!(err instanceof ThermoError)) throw err;
			}
		}
		return { failure: null, ambiguous: true, unreachable: true };
	}
}

/** Reference states: single-phase from (T, ρ), ±1 mK around saturation at fixed P, in and on the dome, near critical. */
export function grid(
	id: string,
	Tc: number,
	rhoc: number,
	Tt: number,
	Tmax: number
): { ref: State; label: string }[] {
	const out: { ref: State; label: string }[] = [];
	const add = (label: string, ref: State) => out.push({ label, ref });
	const T1 = Tt + 0.3 * (Tc - Tt);
	const T2 = Tt + 0.8 * (Tc - Tt);
	for (const T of [T1, T2]) {
		const P = fixState(id, { T, x: 0 }).P;
		add(`liquid 1 mK below saturation at ${P.toPrecision(4)} Pa`, fixState(id, { T: T - 1e-3, P }));
		add(`vapor 1 mK above saturation at ${P.toPrecision(4)} Pa`, fixState(id, { T: T + 1e-3, P }));
		add(`saturated liquid at ${T.toFixed(2)} K`, fixState(id, { T, x: 0 }));
		add(`saturated vapor at ${T.toFixed(2)} K`, fixState(id, { T, x: 1 }));
		add(`mixture x = 0.4 at ${T.toFixed(2)} K`, fixState(id, { T, x: 0.4 }));
	}
	// the first of several densities that lies within the formulation's pressure limit
	const inRange = (T: number, rhos: number[]): State =>
		rhos
			.map((rho) => {
				try {
					return fixState(id, { T, rho });
				} catch {
					return null;
				}
			})
			.find((st) => st !== null)!;
	const rhoL1 = fixState(id, { T: T1, x: 0 }).rho;
	add('compressed liquid', inRange(T1, [1.05 * rhoL1, 1.03 * rhoL1, 1.01 * rhoL1]));
	const Thot = Math.min(1.4 * Tc, Tc + 0.8 * (Tmax - Tc));
	add('superheated vapor', fixState(id, { T: Thot, rho: 0.2 * rhoc }));
	add(
		'supercritical, dense',
		inRange(
			Math.min(1.2 * Tc, Thot),
			[2, 1.8, 1.6, 1.4].map((k) => k * rhoc)
		)
	);
	add('near critical, above', fixState(id, { T: 1.005 * Tc, rho: 1.1 * rhoc }));
	add('near critical, in the dome', fixState(id, { T: 0.995 * Tc, x: 0.5 }));
	return out;
}

/**
 * Fixes every state of the fluid's `grid` again from each of the 21 input pairs (x only on and inside
 * the dome; (T, P) on the dome must be refused, T and P being one property there). Returns the
 * failures as "label from (a, b): why" (skipping those `known` lists) and the pairs tried.
 */
export function gridPairFailures(
	id: string,
	data: { critical: { T: number; rho: number }; triple: { T: number }; limits: { Tmax: number } },
	known: ReadonlySet<string> = new Set()
): { failures: string[]; pairsTried: number } {
	const failures: string[] = [];
	const seen = new Set<string>();
	for (const { label, ref } of grid(
		id,
		data.critical.T,
		data.critical.rho,
		data.triple.T,
		data.limits.Tmax
	)) {
		const inDome = ref.x !== null;
		const rel = inDome ? 1e-5 : 1e-6;
		for (const pair of INPUT_PAIRS) {
			const [a, b] = pair;
			if (!inDome && (a === 'x' || b === 'x')) continue;
			seen.add(`${a},${b}`);
			if (inDome && a === 'T' && b === 'P') {
				try {
					fixState(id, { T: ref.T, P: ref.P });
					failures.push(
						`${label} from (T, P): answered on the dome, where T and P are one property`
					);
				} catch (e) {
					if (!(e instanceof ThermoError)) throw e;
				}
				continue;
			}
			const out = fixFromPair(id, ref, pair, rel);
			if (out.failure && !known.has(`${id}: ${label} from (${a}, ${b})`))
				failures.push(`${label} from (${a}, ${b}): ${out.failure}`);
		}
	}
	return { failures, pairsTried: seen.size };
}
