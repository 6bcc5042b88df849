import {
	BAR,
	BTU_IT,
	BTU_PER_HOUR,
	BTU_PER_LBM,
	BTU_PER_LBM_RANKINE,
	CELSIUS_OFFSET,
	CUBIC_FOOT,
	CUBIC_FOOT_PER_LBM,
	FAHRENHEIT_OFFSET,
	FOOT,
	HORSEPOWER,
	LBM_PER_CUBIC_FOOT,
	LBM_PER_HOUR,
	POUND_FORCE,
	POUND_MASS,
	PSI,
	RANKINE,
	STANDARD_ATMOSPHERE,
	US_GALLON
} from './factors';

/**
 * What a number measures. Each quantity has one SI base unit, the unit the engine and the API
 * speak (K, Pa, m³/kg, kg/m³, J/kg, J/(kg·K), kg, m³, kg/s, J, W, m/s, Pa·s, W/(m·K), N/m; quality,
 * fractions and the Prandtl number 1).
 * `temperatureDifference` (superheat, subcooling, margins) converts without the zero offset.
 */
export type Quantity =
	| 'temperature'
	| 'temperatureDifference'
	| 'pressure'
	| 'specificVolume'
	| 'density'
	| 'specificEnergy'
	| 'specificEntropy'
	| 'mass'
	| 'volume'
	| 'massFlow'
	| 'energy'
	| 'power'
	| 'speed'
	| 'quality'
	| 'fraction'
	| 'viscosity'
	| 'thermalConductivity'
	| 'surfaceTension'
	| 'dimensionless';

/** The quantity of each state property a sheet names (T, P, v, rho, u, h, s, x). */
export const PROPERTY_QUANTITY = {
	T: 'temperature',
	P: 'pressure',
	v: 'specificVolume',
	rho: 'density',
	u: 'specificEnergy',
	h: 'specificEnergy',
	s: 'specificEntropy',
	x: 'quality'
} as const satisfies Record<'T' | 'P' | 'v' | 'rho' | 'u' | 'h' | 's' | 'x', Quantity>;

/** Absolute or gauge: every pressure unit is one or the other, and its label says which. */
export type PressureReference = 'absolute' | 'gauge';

export interface UnitDef {
	/** stable identifier, e.g. `kPa_g`; safe to store in a sheet */
	id: string;
	/** how the unit is printed beside a number, e.g. `kPa g` */
	label: string;
	quantity: Quantity;
	/** pressure units only */
	reference?: PressureReference;
	/** a display unit in the SI engineering or US customary set (others are accepted when typed) */
	system: 'si' | 'us' | 'other';
	/** value in this unit → SI base unit; `atmosphere` (Pa) is used by gauge units only */
	toSI(value: number, atmosphere: number): number;
	/** SI base unit → value in this unit */
	fromSI(si: number, atmosphere: number): number;
}

interface Spec {
	id: string;
	label: string;
	quantity: Quantity;
	system: UnitDef['system'];
	/** SI per unit (multiply), or … */
	factor?: number;
	/** … units per SI (divide; used where 1/factor is the exact number, e.g. 1.8 for °F) */
	divisor?: number;
	/** added in the unit's own scale before scaling (°C: 273.15, °F: 459.67) */
	zero?: number;
	reference?: PressureReference;
	/** typed spellings besides the label, compared after `normaliseUnitText` */
	aliases?: string[];
}

function define(spec: Spec): UnitDef {
	const zero = spec.zero ?? 0;
	const gauge = spec.reference === 'gauge';
	let toSI: (v: number, atm: number) => number;
	let fromSI: (si: number, atm: number) => number;
	if (spec.divisor !== undefined) {
		const d = spec.divisor;
		toSI = (v) => (v + zero) / d;
		fromSI = (si) => si * d - zero;
	} else {
		const f = spec.factor ?? 1;
		toSI = (v) => (v + zero) * f;
		fromSI = (si) => si / f - zero;
	}
	return {
		id: spec.id,
		label: spec.label,
		quantity: spec.quantity,
		system: spec.system,
		...(spec.reference ? { reference: spec.reference } : {}),
		toSI: gauge ? (v, atm) => toSI(v, atm) + atm : toSI,
		fromSI: gauge ? (si, atm) => fromSI(si - atm, atm) : fromSI
	};
}

const specs: Spec[] = [];
const aliasOf = new Map<string, string[]>();
function add(spec: Spec) {
	specs.push(spec);
	aliasOf.set(spec.id, [spec.label, ...(spec.aliases ?? [])]);
}

// temperature (K is the engine's; °C and °F are the display units; °R accepted)
add({ id: 'K', label: 'K', quantity: 'temperature', system: 'other', aliases: ['kelvin'] });
add({
	id: 'degC',
	label: '°C',
	quantity: 'temperature',
	system: 'si',
	zero: CELSIUS_OFFSET,
	aliases: ['C', 'degC', 'celsius']
});
add({
	id: 'degF',
	label: '°F',
	quantity: 'temperature',
	system: 'us',
	zero: FAHRENHEIT_OFFSET,
	divisor: 1.8,
	aliases: ['F', 'degF', 'fahrenheit']
});
add({
	id: 'degR',
	label: '°R',
	quantity: 'temperature',
	system: 'other',
	divisor: 1.8,
	aliases: ['R', 'degR', 'rankine']
});

// temperature differences: same spellings, no offset; shown as K (SI) and °F (US)
add({ id: 'dK', label: 'K', quantity: 'temperatureDifference', system: 'si', aliases: ['kelvin'] });
add({
	id: 'dC',
	label: '°C',
	quantity: 'temperatureDifference',
	system: 'other',
	aliases: ['C', 'degC', 'celsius']
});
add({
	id: 'dF',
	label: '°F',
	quantity: 'temperatureDifference',
	system: 'us',
	divisor: 1.8,
	aliases: ['F', 'degF', 'fahrenheit']
});
add({
	id: 'dR',
	label: '°R',
	quantity: 'temperatureDifference',
	system: 'other',
	divisor: 1.8,
	aliases: ['R', 'degR', 'rankine']
});

// pressure: every unit exists as absolute and gauge. Label convention (ours, used everywhere):
// metric units carry a spaced suffix "a" or "g" (kPa a, kPa g, bar g); psi keeps the trade's
// psia / psig. A pressure is never printed without one of the two.
const pressureBases: {
	base: string;
	factor: number;
	system: UnitDef['system'];
	spaced: boolean;
}[] = [
	{ base: 'Pa', factor: 1, system: 'other', spaced: true },
	{ base: 'kPa', factor: 1e3, system: 'si', spaced: true },
	{ base: 'MPa', factor: 1e6, system: 'si', spaced: true },
	{ base: 'bar', factor: BAR, system: 'si', spaced: true },
	{ base: 'mbar', factor: BAR / 1000, system: 'other', spaced: true },
	{ base: 'psi', factor: PSI, system: 'us', spaced: false }
];
for (const { base, factor, system, spaced } of pressureBases) {
	const sep = spaced ? ' ' : '';
	const extra = base === 'psi' ? ['lbf/in2', 'lb/in2'] : [];
	add({
		id: `${base}_a`,
		label: `${base}${sep}a`,
		quantity: 'pressure',
		system,
		factor,
		reference: 'absolute',
		aliases: [`${base}a`, `${base}abs`, `${base}absolute`, ...extra.map((e) => `${e}abs`)]
	});
	add({
		id: `${base}_g`,
		label: `${base}${sep}g`,
		quantity: 'pressure',
		system,
		factor,
		reference: 'gauge',
		aliases: [`${base}g`, `${base}gauge`, `${base}gage`, ...extra.map((e) => `${e}g`)]
	});
}
add({
	id: 'atm',
	label: 'atm',
	quantity: 'pressure',
	system: 'other',
	factor: STANDARD_ATMOSPHERE,
	reference: 'absolute',
	aliases: ['atma']
});

add({ id: 'm3/kg', label: 'm³/kg', quantity: 'specificVolume', system: 'si' });
add({
	id: 'L/kg',
	label: 'L/kg',
	quantity: 'specificVolume',
	system: 'other',
	factor: 1e-3,
	aliases: ['l/kg', 'dm3/kg']
});
add({
	id: 'cm3/g',
	label: 'cm³/g',
	quantity: 'specificVolume',
	system: 'other',
	factor: 1e-3,
	aliases: ['ml/g', 'mL/g']
});
add({
	id: 'ft3/lbm',
	label: 'ft³/lbm',
	quantity: 'specificVolume',
	system: 'us',
	factor: CUBIC_FOOT_PER_LBM,
	aliases: ['ft3/lb', 'cuft/lb', 'cuft/lbm']
});

add({ id: 'kg/m3', label: 'kg/m³', quantity: 'density', system: 'si' });
add({
	id: 'g/cm3',
	label: 'g/cm³',
	quantity: 'density',
	system: 'other',
	factor: 1e3,
	aliases: ['g/ml', 'g/mL', 'kg/L', 'kg/l', 'kg/dm3']
});
add({
	id: 'lbm/ft3',
	label: 'lbm/ft³',
	quantity: 'density',
	system: 'us',
	factor: LBM_PER_CUBIC_FOOT,
	aliases: ['lb/ft3', 'lb/cuft', 'lbm/cuft']
});

add({ id: 'J/kg', label: 'J/kg', quantity: 'specificEnergy', system: 'other' });
add({ id: 'kJ/kg', label: 'kJ/kg', quantity: 'specificEnergy', system: 'si', factor: 1e3 });
add({ id: 'MJ/kg', label: 'MJ/kg', quantity: 'specificEnergy', system: 'other', factor: 1e6 });
add({
	id: 'Btu/lbm',
	label: 'Btu/lbm',
	quantity: 'specificEnergy',
	system: 'us',
	factor: BTU_PER_LBM,
	aliases: ['Btu/lb', 'BTU/lb', 'BTU/lbm']
});

add({
	id: 'J/(kg·K)',
	label: 'J/(kg·K)',
	quantity: 'specificEntropy',
	system: 'other',
	aliases: ['J/kg/K', 'J/kgC', 'J/kg/C']
});
add({
	id: 'kJ/(kg·K)',
	label: 'kJ/(kg·K)',
	quantity: 'specificEntropy',
	system: 'si',
	factor: 1e3,
	aliases: ['kJ/kg/K', 'kJ/kgC', 'kJ/kg/C']
});
add({
	id: 'Btu/(lbm·°R)',
	label: 'Btu/(lbm·°R)',
	quantity: 'specificEntropy',
	system: 'us',
	factor: BTU_PER_LBM_RANKINE,
	aliases: [
		'Btu/lbm/R',
		'Btu/lbR',
		'Btu/lb/R',
		'Btu/lbmF',
		'Btu/lbF',
		'Btu/lb/F',
		'Btu/lbm/F',
		'BTU/lbR',
		'BTU/lbF'
	]
});

add({ id: 'kg', label: 'kg', quantity: 'mass', system: 'si' });
add({ id: 'g', label: 'g', quantity: 'mass', system: 'other', factor: 1e-3 });
add({ id: 't', label: 't', quantity: 'mass', system: 'other', factor: 1e3, aliases: ['tonne'] });
add({
	id: 'lbm',
	label: 'lbm',
	quantity: 'mass',
	system: 'us',
	factor: POUND_MASS,
	aliases: ['lb', 'lbs']
});

add({ id: 'm3', label: 'm³', quantity: 'volume', system: 'si' });
add({
	id: 'L',
	label: 'L',
	quantity: 'volume',
	system: 'other',
	factor: 1e-3,
	aliases: ['l', 'dm3', 'litre', 'liter']
});
add({
	id: 'ft3',
	label: 'ft³',
	quantity: 'volume',
	system: 'us',
	factor: CUBIC_FOOT,
	aliases: ['cuft']
});
add({
	id: 'gal',
	label: 'US gal',
	quantity: 'volume',
	system: 'other',
	factor: US_GALLON,
	aliases: ['gal', 'USgal']
});

add({ id: 'kg/s', label: 'kg/s', quantity: 'massFlow', system: 'si' });
add({
	id: 'kg/h',
	label: 'kg/h',
	quantity: 'massFlow',
	system: 'other',
	factor: 1 / 3600,
	aliases: ['kg/hr']
});
add({
	id: 'lbm/h',
	label: 'lbm/h',
	quantity: 'massFlow',
	system: 'us',
	factor: LBM_PER_HOUR,
	aliases: ['lb/h', 'lb/hr', 'lbm/hr']
});
add({
	id: 'lbm/s',
	label: 'lbm/s',
	quantity: 'massFlow',
	system: 'other',
	factor: POUND_MASS,
	aliases: ['lb/s', 'lb/sec']
});

add({ id: 'J', label: 'J', quantity: 'energy', system: 'other' });
add({ id: 'kJ', label: 'kJ', quantity: 'energy', system: 'si', factor: 1e3 });
add({ id: 'MJ', label: 'MJ', quantity: 'energy', system: 'other', factor: 1e6 });
add({ id: 'GJ', label: 'GJ', quantity: 'energy', system: 'other', factor: 1e9 });
add({
	id: 'Btu',
	label: 'Btu',
	quantity: 'energy',
	system: 'us',
	factor: BTU_IT,
	aliases: ['BTU']
});
add({
	id: 'MMBtu',
	label: 'MMBtu',
	quantity: 'energy',
	system: 'other',
	factor: BTU_IT * 1e6,
	aliases: ['MMBTU']
});

add({ id: 'W', label: 'W', quantity: 'power', system: 'other' });
add({ id: 'kW', label: 'kW', quantity: 'power', system: 'si', factor: 1e3 });
add({ id: 'MW', label: 'MW', quantity: 'power', system: 'other', factor: 1e6 });
add({
	id: 'Btu/h',
	label: 'Btu/h',
	quantity: 'power',
	system: 'us',
	factor: BTU_PER_HOUR,
	aliases: ['Btu/hr', 'BTU/h', 'BTU/hr']
});
add({ id: 'hp', label: 'hp', quantity: 'power', system: 'us', factor: HORSEPOWER });

add({ id: 'm/s', label: 'm/s', quantity: 'speed', system: 'si' });
add({
	id: 'ft/s',
	label: 'ft/s',
	quantity: 'speed',
	system: 'us',
	factor: FOOT,
	aliases: ['fps', 'ft/sec']
});

add({ id: 'x1', label: '', quantity: 'quality', system: 'si' });
add({
	id: 'x%',
	label: '%',
	quantity: 'quality',
	system: 'other',
	factor: 0.01,
	aliases: ['percent']
});
add({ id: 'f1', label: '', quantity: 'fraction', system: 'other' });
add({
	id: 'f%',
	label: '%',
	quantity: 'fraction',
	system: 'si',
	factor: 0.01,
	aliases: ['percent']
});

// Transport and interface properties (dynamic viscosity, thermal conductivity, surface tension) and
// the Prandtl number. US customary: lbm/(ft·h), Btu_IT/(h·ft·°F), lbf/ft.
add({
	id: 'Pa·s',
	label: 'Pa·s',
	quantity: 'viscosity',
	system: 'other',
	aliases: ['Pa s', 'Pas']
});
add({
	id: 'mPa·s',
	label: 'mPa·s',
	quantity: 'viscosity',
	system: 'other',
	factor: 1e-3,
	aliases: ['mPa s', 'cP']
});
add({
	id: 'μPa·s',
	label: 'μPa·s',
	quantity: 'viscosity',
	system: 'si',
	factor: 1e-6,
	aliases: ['uPa·s', 'uPa s', 'μPa s']
});
add({
	id: 'lbm/(ft·h)',
	label: 'lbm/(ft·h)',
	quantity: 'viscosity',
	system: 'us',
	factor: POUND_MASS / (FOOT * 3600),
	aliases: ['lbm/ft/h', 'lb/ft/h', 'lbm/ft·h']
});
add({
	id: 'W/(m·K)',
	label: 'W/(m·K)',
	quantity: 'thermalConductivity',
	system: 'si',
	aliases: ['W/m/K', 'W/mK']
});
add({
	id: 'mW/(m·K)',
	label: 'mW/(m·K)',
	quantity: 'thermalConductivity',
	system: 'other',
	factor: 1e-3,
	aliases: ['mW/m/K', 'mW/mK']
});
add({
	id: 'Btu/(h·ft·°F)',
	label: 'Btu/(h·ft·°F)',
	quantity: 'thermalConductivity',
	system: 'us',
	factor: BTU_IT / (3600 * FOOT * RANKINE),
	aliases: ['Btu/h/ft/F', 'Btu/hftF', 'BTU/h/ft/F']
});
add({ id: 'N/m', label: 'N/m', quantity: 'surfaceTension', system: 'other' });
add({
	id: 'mN/m',
	label: 'mN/m',
	quantity: 'surfaceTension',
	system: 'si',
	factor: 1e-3,
	aliases: ['dyn/cm']
});
add({
	id: 'lbf/ft',
	label: 'lbf/ft',
	quantity: 'surfaceTension',
	system: 'us',
	factor: POUND_FORCE / FOOT
});
add({ id: 'one', label: '', quantity: 'dimensionless', system: 'si' });

/** Every unit Statewright knows, by id. */
export const UNITS: Readonly<Record<string, UnitDef>> = Object.freeze(
	Object.fromEntries(specs.map((s) => [s.id, define(s)]))
);

/** The SI base unit of each quantity (what the engine and API use). */
export const SI_BASE: Readonly<Record<Quantity, string>> = {
	temperature: 'K',
	temperatureDifference: 'dK',
	pressure: 'Pa_a',
	specificVolume: 'm3/kg',
	density: 'kg/m3',
	specificEnergy: 'J/kg',
	specificEntropy: 'J/(kg·K)',
	mass: 'kg',
	volume: 'm3',
	massFlow: 'kg/s',
	energy: 'J',
	power: 'W',
	speed: 'm/s',
	quality: 'x1',
	fraction: 'f1',
	viscosity: 'Pa·s',
	thermalConductivity: 'W/(m·K)',
	surfaceTension: 'N/m',
	dimensionless: 'one'
};

/** A unit by id; throws for an unknown id (ids are code, not user input). */
export function unitById(id: string): UnitDef {
	const u = UNITS[id];
	if (!u) throw new Error(`unknown unit id "${id}"`);
	return u;
}

/**
 * Canonical form of a typed unit for look-up: superscripts and carets become plain digits,
 * degree signs, the word "deg", spaces, brackets and product dots vanish.
 * "kJ/(kg · K)" → "kJ/kgK", "m³/kg" → "m3/kg", "kPa (g)" → "kPag", "°C" → "C".
 */
export function normaliseUnitText(text: string): string {
	return text
		.normalize('NFKC')
		.replace(/[³]/g, '3')
		.replace(/[²]/g, '2')
		.replace(/\^|\*\*/g, '')
		.replace(/[°º˚]/g, '')
		.replace(/\bdeg(rees?)?\s*(?=[CFRK]\b)/gi, '')
		.replace(/[\s()[\]·⋅•*.\-_]/g, '');
}

interface AliasIndex {
	exact: Map<string, UnitDef[]>;
	folded: Map<string, UnitDef[]>;
}

function buildIndex(): AliasIndex {
	const exact = new Map<string, UnitDef[]>();
	const folded = new Map<string, UnitDef[]>();
	const put = (m: Map<string, UnitDef[]>, k: string, u: UnitDef) => {
		const list = m.get(k) ?? [];
		if (!list.includes(u)) list.push(u);
		m.set(k, list);
	};
	for (const [id, names] of aliasOf) {
		const u = UNITS[id];
		for (const n of names) {
			if (n === '') continue;
			const k = normaliseUnitText(n);
			put(exact, k, u);
			put(folded, k.toLowerCase(), u);
		}
	}
	return { exact, folded };
}

let index: AliasIndex | null = null;

/**
 * Units a typed unit text can mean, optionally limited to one quantity. Exact spelling wins;
 * otherwise a case-insensitive match is used ("kpa g", "Mpa") unless it is ambiguous.
 */
export function lookupUnit(text: string, quantity?: Quantity): UnitDef[] {
	index ??= buildIndex();
	const key = normaliseUnitText(text);
	if (key === '') return [];
	const keep = (list: UnitDef[] | undefined) =>
		(list ?? []).filter((u) => !quantity || u.quantity === quantity);
	const exact = keep(index.exact.get(key));
	if (exact.length) return exact;
	return keep(index.folded.get(key.toLowerCase()));
}

/** The typed spellings that name pressure units without saying absolute or gauge. */
export const BARE_PRESSURE: Readonly<Record<string, string>> = Object.freeze({
	Pa: 'Pa',
	kPa: 'kPa',
	MPa: 'MPa',
	bar: 'bar',
	mbar: 'mbar',
	psi: 'psi',
	'lbf/in2': 'psi',
	'lb/in2': 'psi'
});

/** Units of one quantity, e.g. for an error message listing what is accepted. */
export function unitsOf(quantity: Quantity): UnitDef[] {
	return Object.values(UNITS).filter((u) => u.quantity === quantity);
}
