import { UNITS, unitById, type PressureReference, type Quantity, type UnitDef } from './catalogue';
import { DEFAULT_ATMOSPHERE } from './factors';

export type UnitSystem = 'si' | 'us';
/** SI engineering pressure unit; `auto` picks kPa or MPa by magnitude. US customary is always psi. */
export type SiPressureUnit = 'kPa' | 'MPa' | 'bar' | 'auto';
/**
 * US customary power. Btu/h is the default so that heat and work rates of a device read in one
 * unit and can be added; hp is offered for shaft work by those who think in it.
 */
export type UsPowerUnit = 'Btu/h' | 'hp';

/** A sheet's units preference. Stored with the sheet; the engine and the API never see it. */
export interface UnitPrefs {
	system: UnitSystem;
	pressureUnit: SiPressureUnit;
	/** whether pressures are shown as absolute or gauge (typed values may be either) */
	pressureReference: PressureReference;
	usPower: UsPowerUnit;
	/** the sheet's atmospheric pressure for gauge readings, Pa absolute (default 101 325 Pa) */
	atmosphere: number;
}

export const DEFAULT_UNIT_PREFS: Readonly<UnitPrefs> = Object.freeze({
	system: 'si',
	pressureUnit: 'kPa',
	pressureReference: 'absolute',
	usPower: 'Btu/h',
	atmosphere: DEFAULT_ATMOSPHERE
});

export function unitPrefs(partial: Partial<UnitPrefs> = {}): UnitPrefs {
	return { ...DEFAULT_UNIT_PREFS, ...partial };
}

const SI_DISPLAY: Record<Exclude<Quantity, 'pressure' | 'power'>, string> = {
	temperature: 'degC',
	temperatureDifference: 'dK',
	specificVolume: 'm3/kg',
	density: 'kg/m3',
	specificEnergy: 'kJ/kg',
	specificEntropy: 'kJ/(kg·K)',
	mass: 'kg',
	volume: 'm3',
	massFlow: 'kg/s',
	energy: 'kJ',
	speed: 'm/s',
	quality: 'x1',
	fraction: 'f%',
	viscosity: 'μPa·s',
	thermalConductivity: 'W/(m·K)',
	surfaceTension: 'mN/m',
	dimensionless: 'one'
};

const US_DISPLAY: Record<Exclude<Quantity, 'pressure' | 'power'>, string> = {
	temperature: 'degF',
	temperatureDifference: 'dF',
	specificVolume: 'ft3/lbm',
	density: 'lbm/ft3',
	specificEnergy: 'Btu/lbm',
	specificEntropy: 'Btu/(lbm·°R)',
	mass: 'lbm',
	volume: 'ft3',
	massFlow: 'lbm/h',
	energy: 'Btu',
	speed: 'ft/s',
	quality: 'x1',
	fraction: 'f%',
	viscosity: 'lbm/(ft·h)',
	thermalConductivity: 'Btu/(h·ft·°F)',
	surfaceTension: 'lbf/ft',
	dimensionless: 'one'
};

/** Larger units tried for a magnitude where the user has not fixed one (smallest first). */
const LADDERS: Partial<Record<Quantity, { si: string[]; us: string[] }>> = {
	pressure: { si: ['kPa', 'MPa'], us: ['psi'] },
	energy: { si: ['kJ', 'MJ', 'GJ'], us: ['Btu', 'MMBtu'] },
	power: { si: ['kW', 'MW'], us: [] },
	mass: { si: ['kg', 't'], us: ['lbm'] },
	volume: { si: ['L', 'm3'], us: ['ft3'] }
};

export interface DisplayOptions {
	/** pressure only: show this reference instead of the preference (a log axis is always absolute) */
	reference?: PressureReference;
	/** SI values the unit should suit; used where the preference leaves the choice open */
	magnitude?: number | readonly number[];
}

function largest(values: number | readonly number[] | undefined): number | undefined {
	if (values === undefined) return undefined;
	const list = typeof values === 'number' ? [values] : values;
	let m = 0;
	for (const v of list) if (Number.isFinite(v)) m = Math.max(m, Math.abs(v));
	return m > 0 ? m : undefined;
}

/** The largest unit of a ladder in which the magnitude is still ≥ 1 (else the smallest). */
function climb(
	ids: string[],
	magnitude: number | undefined,
	idOf: (base: string) => string
): string {
	let pick = ids[0];
	if (magnitude === undefined) return idOf(pick);
	for (const base of ids) {
		const u = unitById(idOf(base));
		if (Math.abs(u.fromSI(magnitude, 0) - u.fromSI(0, 0)) >= 1) pick = base;
	}
	return idOf(pick);
}

/**
 * The unit a quantity is shown in under a preference. Pressure follows the preferred unit and
 * reference (or `options.reference`); quantities with a magnitude ladder use the preference's
 * system default unless `options.magnitude` is given, then the unit that suits that magnitude.
 */
export function displayUnit(
	quantity: Quantity,
	prefs: UnitPrefs,
	options: DisplayOptions = {}
): UnitDef {
	const mag = largest(options.magnitude);
	if (quantity === 'pressure') {
		const ref = options.reference ?? prefs.pressureReference;
		const suffix = ref === 'gauge' ? '_g' : '_a';
		if (prefs.system === 'us') return unitById(`psi${suffix}`);
		if (prefs.pressureUnit !== 'auto') return unitById(`${prefs.pressureUnit}${suffix}`);
		// absolute magnitude decides even for gauge display, so a column keeps one unit
		return unitById(climb(LADDERS.pressure!.si, mag, (b) => `${b}${suffix}`));
	}
	if (quantity === 'power') {
		if (prefs.system === 'us') return unitById(prefs.usPower);
		return mag === undefined ? unitById('kW') : unitById(climb(LADDERS.power!.si, mag, (b) => b));
	}
	const ladder = LADDERS[quantity]?.[prefs.system];
	if (mag !== undefined && ladder && ladder.length > 1)
		return unitById(climb(ladder, mag, (b) => b));
	return unitById((prefs.system === 'us' ? US_DISPLAY : SI_DISPLAY)[quantity]);
}

/**
 * A good unit for a magnitude (or the largest of several values, e.g. a table column) where the
 * user has not fixed one: 0.05 m³ → L, 2.5e6 J → MJ, 4e6 Pa → MPa (with pressure unit `auto`).
 */
export function chooseUnit(
	quantity: Quantity,
	siValues: number | readonly number[],
	prefs: UnitPrefs
): UnitDef {
	return displayUnit(quantity, prefs, { magnitude: siValues });
}

/** SI base value → number in `unit`. */
export function toUnit(
	si: number,
	unit: UnitDef | string,
	atmosphere: number = DEFAULT_ATMOSPHERE
): number {
	const u = typeof unit === 'string' ? unitById(unit) : unit;
	return u.fromSI(si, atmosphere);
}

/** Number in `unit` → SI base value. */
export function fromUnit(
	value: number,
	unit: UnitDef | string,
	atmosphere: number = DEFAULT_ATMOSPHERE
): number {
	const u = typeof unit === 'string' ? unitById(unit) : unit;
	return u.toSI(value, atmosphere);
}

/** Number in one unit → number in another of the same quantity. */
export function convert(
	value: number,
	from: UnitDef | string,
	to: UnitDef | string,
	atmosphere: number = DEFAULT_ATMOSPHERE
): number {
	const f = typeof from === 'string' ? unitById(from) : from;
	const t = typeof to === 'string' ? unitById(to) : to;
	if (f.quantity !== t.quantity)
		throw new Error(
			`cannot convert ${f.label || f.id} (${f.quantity}) to ${t.label || t.id} (${t.quantity})`
		);
	return t.fromSI(f.toSI(value, atmosphere), atmosphere);
}

/** SI base value → number in the preference's display unit, with that unit. */
export function toDisplay(
	si: number,
	quantity: Quantity,
	prefs: UnitPrefs,
	options: DisplayOptions = {}
): { value: number; unit: UnitDef } {
	const unit = displayUnit(quantity, prefs, options);
	return { value: unit.fromSI(si, prefs.atmosphere), unit };
}

/** Every display unit of a system, for pickers. */
export function displayUnitsOf(quantity: Quantity, system: UnitSystem): UnitDef[] {
	return Object.values(UNITS).filter((u) => u.quantity === quantity && u.system === system);
}
