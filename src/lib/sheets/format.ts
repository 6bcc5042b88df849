/**
 * Numbers of the state and leg table in the sheet's display units, with significant figures an
 * engineer expects: temperatures to 0.01, quality to 4 decimals, everything else 5 significant.
 */
import {
	chooseUnit,
	displayUnit,
	formatNumber,
	formatQuantity,
	type Formatted,
	type Quantity,
	type UnitDef,
	type UnitPrefs
} from '$lib/units';
import { processStyle } from '$lib/charts/encoding';
import {
	FORMULATION_NAME,
	PHASE_NAME,
	type Formulation,
	type PathState,
	type Phase,
	type State
} from '$lib/thermo/types';
import type { EditableProp } from './doc';

export const PROP_QUANTITY: Record<EditableProp, Quantity> = {
	T: 'temperature',
	P: 'pressure',
	v: 'specificVolume',
	u: 'specificEnergy',
	h: 'specificEnergy',
	s: 'specificEntropy',
	x: 'quality'
};

export const PROP_NAME: Record<EditableProp, string> = {
	T: 'temperature',
	P: 'pressure',
	v: 'specific volume',
	u: 'internal energy',
	h: 'enthalpy',
	s: 'entropy',
	x: 'quality'
};

/** The unit a table column is shown in (pressures: absolute or gauge as the sheet says). */
export function columnUnit(prop: EditableProp, prefs: UnitPrefs): UnitDef {
	return displayUnit(PROP_QUANTITY[prop], prefs);
}

/** A column's unit label; quality has none. */
export function columnUnitLabel(prop: EditableProp, prefs: UnitPrefs): string {
	if (prop === 'x') return '–';
	return columnUnit(prop, prefs).label;
}

/** One cell: the number only (its unit is in the column head). */
export function cellText(state: State, prop: EditableProp, prefs: UnitPrefs): string {
	if (prop === 'x') return state.x === null ? '—' : formatQuantity(state.x, 'quality', prefs).text;
	return formatQuantity(state[prop], PROP_QUANTITY[prop], prefs).text;
}

/** A value with its unit, e.g. "180.00 °C", "7.0000 bar g". */
export function withUnit(si: number, prop: EditableProp, prefs: UnitPrefs): string {
	return formatQuantity(si, PROP_QUANTITY[prop], prefs).full;
}

/**
 * Round-off to zero: an isentropic leg's Δs or an isochoric leg's w comes back from the
 * quadrature as ±10⁻¹² or so; printed as "4.5×10⁻¹³ kJ/kg" it reads as a real number.
 * Below these magnitudes (SI: J/kg, J/(kg·K), J or W) a value is shown as 0.
 */
const NOISE = { specificEnergy: 1e-6, specificEntropy: 1e-9, total: 1e-6 } as const;

export function tidy(si: number, kind: keyof typeof NOISE): number {
	return Math.abs(si) < NOISE[kind] ? 0 : si;
}

export function specificEnergy(si: number, prefs: UnitPrefs): Formatted {
	return formatQuantity(tidy(si, 'specificEnergy'), 'specificEnergy', prefs);
}

export function specificEntropy(si: number, prefs: UnitPrefs): Formatted {
	return formatQuantity(tidy(si, 'specificEntropy'), 'specificEntropy', prefs);
}

export function temperatureDifference(si: number, prefs: UnitPrefs): Formatted {
	return formatQuantity(si, 'temperatureDifference', prefs);
}

/**
 * Totals: energy (J) for a closed system, power (W) for a device, in a unit that suits the
 * column's largest value (kJ or MJ; kW or MW; Btu, Btu/h or hp).
 */
export function totalUnit(kind: 'J' | 'W', values: readonly number[], prefs: UnitPrefs): UnitDef {
	return chooseUnit(kind === 'J' ? 'energy' : 'power', values.length ? values : [0], prefs);
}

export function total(si: number, kind: 'J' | 'W', unit: UnitDef, prefs: UnitPrefs): string {
	return formatQuantity(tidy(si, 'total'), kind === 'J' ? 'energy' : 'power', prefs, { unit }).full;
}

export function phaseText(p: Phase): string {
	return PHASE_NAME[p];
}

/** Relative uncertainty past which the state table says how loosely the inputs fix T, P or v. */
export const PRECISION_SHOWN = 1e-6;

/** "P uncertain by ±0.89 % (…)" for each of T, P, v the state's inputs fix worse than PRECISION_SHOWN. */
export function precisionNotes(precision: State['precision']): string[] {
	if (!precision) return [];
	return (['T', 'P', 'v'] as const)
		.filter((k) => precision[k] > PRECISION_SHOWN)
		.map(
			(k) =>
				`${k} uncertain by ±${Number((precision[k] * 100).toPrecision(2))} % (the given pair barely fixes it)`
		);
}

/** A value with its unit, trailing zeros trimmed ("0.5 m³", "12 kg", "0.04 kg/s"): for prose, not for tables. */
export function compactQuantity(si: number, q: Quantity, prefs: UnitPrefs): string {
	const f = formatQuantity(si, q, prefs, { sig: 4 });
	const text =
		f.text.includes('×') || !f.text.includes('.') ? f.text : f.text.replace(/\.?0+$/, '');
	return f.unit.label ? `${text}\u00a0${f.unit.label}` : text;
}

/** A leg's process in words, with n for a polytropic leg ("polytropic, n = 1.3"). */
export function processText(process: string, n?: number): string {
	const name = processStyle(process as Parameters<typeof processStyle>[0])?.name ?? process;
	return process === 'polytropic' && n !== undefined
		? `${name}, n = ${formatNumber(n, { sig: 4 })}`
		: name;
}

/**
 * The formulation a sheet's numbers come from, as the state table names it: water's "IAPWS-95" or
 * "IAPWS-IF97"; for another fluid its own equation's name (`fluidFormulation`, from FluidInfo).
 */
export function formulationText(
	fluid: string,
	formulation: Formulation | undefined,
	fluidFormulation?: string
): string {
	if (fluid === 'water') return FORMULATION_NAME[formulation ?? 'iapws95'];
	return fluidFormulation ?? '';
}

/** The properties the difference row of an IAPWS-IF97 sheet shows (IF97 − IAPWS-95). */
export const DIFFERENCE_PROPS = ['T', 'P', 'v', 'u', 'h', 's'] as const;

/**
 * IF97 − IAPWS-95 of one property of a state, with its unit ("+0.0021 K", "−3.4 Pa"): temperatures
 * as a temperature difference, pressures in the sheet's absolute unit (a difference has no gauge
 * zero), 3 significant figures; null where the state carries no IAPWS-95 value.
 */
export function differenceText(
	ps: PathState,
	prop: (typeof DIFFERENCE_PROPS)[number],
	prefs: UnitPrefs
): string | null {
	const ref = ps.iapws95;
	if (!ref) return null;
	const raw = ps.state[prop] - ref[prop];
	// the same input given back by both (a P of the pair, say) differs by round-off only: 0
	const d = Math.abs(raw) <= 1e-12 * Math.abs(ref[prop]) ? 0 : raw;
	const q: Quantity = prop === 'T' ? 'temperatureDifference' : PROP_QUANTITY[prop];
	const f = formatQuantity(d, q, prefs, { sig: 3, reference: 'absolute' });
	const sign = d > 0 ? '+' : '';
	return `${sign}${f.full}`;
}
