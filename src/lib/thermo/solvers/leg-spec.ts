/**
 * A leg spec's validation: the process, the target (key and value), n for a polytropic leg and the
 * number of points, each refused with invalid-leg saying what to give instead. The start is checked
 * by fixState when the leg is traced (legs.ts).
 */
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { getCompiledFluid } from '../registry.ts';
import type { LegSpec, Process, TargetName } from '../types.ts';

export const PROCESSES: readonly Process[] = [
	'isobaric',
	'isochoric',
	'isothermal',
	'isentropic',
	'isenthalpic',
	'polytropic'
];
export const TARGET_NAMES: readonly TargetName[] = ['T', 'P', 'v', 'rho', 'u', 'h', 's', 'x'];
/** Default, least and greatest number of points along a leg. */
export const SAMPLES_DEFAULT = 40;
export const SAMPLES_MIN = 20;
export const SAMPLES_MAX = 2000;
/** Largest |n| accepted for a polytropic leg. */
export const N_MAX = 50;

export const TARGET_UNIT: Record<TargetName, string> = {
	T: 'K',
	P: 'Pa',
	v: 'm³/kg',
	rho: 'kg/m³',
	u: 'J/kg',
	h: 'J/kg',
	s: 'J/(kg·K)',
	x: ''
};
const INVARIANT_KEYS: Record<Process, TargetName[]> = {
	isobaric: ['P'],
	isochoric: ['v', 'rho'],
	isothermal: ['T'],
	isentropic: ['s'],
	isenthalpic: ['h'],
	polytropic: []
};

export const THROTTLING_NOTE =
	'Throttling is irreversible: no reversible heat or work belongs to it, so its heat and work (boundary and shaft) are reported as 0; its enthalpy is unchanged and its entropy rises.';

function invalid(message: string, hint: string): ThermoError {
	return new ThermoError('invalid-leg', message, hint);
}

/** Checked leg spec: the target key and value, n and samples. */
export interface CheckedLeg {
	fl: Fluid;
	process: Process;
	key: TargetName;
	value: number;
	n: number | undefined;
	samples: number;
}

/** Validate a leg spec (everything but the start, which fixState checks). Throws ThermoError. */
export function checkLegSpec(spec: LegSpec): CheckedLeg {
	if (typeof spec !== 'object' || spec === null)
		throw invalid(
			'A leg must be an object { fluid, start, process, target, n?, samples? }.',
			'Send the leg as a JSON object.'
		);
	const fl = getCompiledFluid(spec.fluid);
	const process = spec.process;
	if (!PROCESSES.includes(process))
		throw invalid(`Unknown process "${String(process)}".`, `Use one of: ${PROCESSES.join(', ')}.`);
	const target = spec.target as Record<string, unknown>;
	if (typeof target !== 'object' || target === null || Array.isArray(target))
		throw invalid(
			'The target must be an object holding one property, e.g. { "T": 450 }.',
			`Give exactly one of ${TARGET_NAMES.join(', ')}.`
		);
	const keys = Object.keys(target).filter((k) => target[k] !== undefined);
	for (const k of keys)
		if (!TARGET_NAMES.includes(k as TargetName))
			throw invalid(
				`Unknown target property "${k}".`,
				`Give exactly one of ${TARGET_NAMES.join(', ')} (SI units).`
			);
	if (keys.length !== 1)
		throw invalid(
			`A leg ends on exactly one target property; got ${keys.length}${keys.length ? ` (${keys.join(', ')})` : ''}.`,
			`Give exactly one of ${TARGET_NAMES.join(', ')}; the process supplies the other.`
		);
	const key = keys[0] as TargetName;
	const value = target[key];
	if (typeof value !== 'number' || !Number.isFinite(value))
		throw new ThermoError(
			'non-finite-input',
			`The target ${key} must be a finite number (got ${String(value)}).`,
			`Give ${key} as a finite number in ${TARGET_UNIT[key] || 'SI units'}.`
		);
	if ((key === 'T' || key === 'P' || key === 'v' || key === 'rho') && !(value > 0))
		throw new ThermoError(
			'non-positive-input',
			`The target ${key} must be positive (got ${fmt(value, 0)}); the engine uses absolute values.`,
			`Give ${key} in ${TARGET_UNIT[key]} as a positive absolute value (kelvin, absolute pressure).`
		);
	if (key === 'x' && !(value >= 0 && value <= 1))
		throw new ThermoError(
			'quality-out-of-range',
			`The target quality x must lie between 0 and 1 (got ${fmt(value, 0, 1)}).`,
			'Give x from 0 (saturated liquid) to 1 (saturated vapor).'
		);
	let n: number | undefined;
	if (process === 'polytropic') {
		if (typeof spec.n !== 'number' || !Number.isFinite(spec.n))
			throw invalid(
				`A polytropic leg needs a finite exponent n (P·vⁿ = const); got ${String(spec.n)}.`,
				`Give n, for example 1.3; from −${N_MAX} to ${N_MAX}.`
			);
		if (Math.abs(spec.n) > N_MAX)
			throw invalid(
				`The polytropic exponent n = ${fmt(spec.n)} is outside −${N_MAX}…${N_MAX}.`,
				'Use an isochoric leg for very large n.'
			);
		n = spec.n;
	}
	if (INVARIANT_KEYS[process].includes(key) || (process === 'polytropic' && n === 0 && key === 'P'))
		throw new ThermoError(
			'target-is-invariant',
			`${process === 'polytropic' ? 'A polytropic leg with n = 0' : `An ${process} leg`} keeps ${key === 'rho' ? 'rho (= 1/v)' : key} fixed, so ${key} cannot be its target.`,
			`Give the end by another property: one of ${TARGET_NAMES.filter((k) => !INVARIANT_KEYS[process].includes(k)).join(', ')}.`
		);
	let samples = SAMPLES_DEFAULT;
	if (spec.samples !== undefined) {
		if (
			typeof spec.samples !== 'number' ||
			!Number.isInteger(spec.samples) ||
			spec.samples < SAMPLES_MIN ||
			spec.samples > SAMPLES_MAX
		)
			throw invalid(
				`samples must be a whole number from ${SAMPLES_MIN} to ${SAMPLES_MAX} (got ${String(spec.samples)}).`,
				`Leave samples out for ${SAMPLES_DEFAULT} points, or give ${SAMPLES_MIN}…${SAMPLES_MAX}.`
			);
		samples = spec.samples;
	}
	return { fl, process, key, value, n, samples };
}
