import {
	BARE_PRESSURE,
	lookupUnit,
	normaliseUnitText,
	unitById,
	unitsOf,
	type PressureReference,
	type Quantity,
	type UnitDef
} from './catalogue';
import { DEFAULT_ATMOSPHERE } from './factors';
import { formatNumber } from './format';

export type ParseErrorCode =
	| 'empty'
	| 'not-a-number'
	| 'decimal-comma'
	| 'no-unit'
	| 'unknown-unit'
	| 'wrong-quantity'
	| 'below-absolute-zero'
	| 'below-vacuum'
	| 'not-positive'
	| 'out-of-range';

export interface ParseError {
	code: ParseErrorCode;
	/** what was wrong and what to give instead, ready to show beside the field */
	message: string;
}

export type ParseResult =
	| {
			ok: true;
			/** the value in the quantity's SI base unit (pressures absolute, Pa) */
			si: number;
			/** the number as typed */
			number: number;
			unit: UnitDef;
			/**
			 * set when part of the reading was not typed: `unit` (bare number, the field's unit used)
			 * or `reference` (pressure unit without a/g, read per `bareReference`)
			 */
			assumed?: 'unit' | 'reference';
	  }
	| { ok: false; error: ParseError };

export interface ParseOptions {
	/** the sheet's atmospheric pressure, Pa absolute (default 101 325 Pa) */
	atmosphere?: number;
	/** unit applied to a bare number, usually the unit the field shows; without it a unit is required */
	defaultUnit?: UnitDef | string;
	/** how to read a pressure unit typed without a or g ("3.5 bar"); default absolute */
	bareReference?: PressureReference;
}

const EXAMPLES: Record<Quantity, string> = {
	temperature: '120 °C, 250 °F or 393.15 K',
	temperatureDifference: '5 K or 9 °F',
	pressure: '250 kPa g, 3.5 bar a, 1.2 MPa a or 200 psig',
	specificVolume: '0.194 m³/kg or 3.1 ft³/lbm',
	density: '958 kg/m³ or 59.8 lbm/ft³',
	specificEnergy: '2778 kJ/kg or 1194 Btu/lbm',
	specificEntropy: '6.58 kJ/(kg·K) or 1.57 Btu/(lbm·°R)',
	mass: '12 kg or 26 lbm',
	volume: '0.5 m³, 500 L or 17.6 ft³',
	massFlow: '0.8 kg/s or 6350 lbm/h',
	energy: '1500 kJ or 1420 Btu',
	power: '25 kW, 85 000 Btu/h or 34 hp',
	speed: '340 m/s or 1115 ft/s',
	quality: '0.35 or 35 %',
	fraction: '0.6 or 60 %',
	viscosity: '890 μPa·s, 0.89 mPa·s or 2.15 lbm/(ft·h)',
	thermalConductivity: '0.61 W/(m·K) or 0.35 Btu/(h·ft·°F)',
	surfaceTension: '72 mN/m or 0.0049 lbf/ft',
	dimensionless: '6.1'
};

const NAMES: Record<Quantity, string> = {
	temperature: 'a temperature',
	temperatureDifference: 'a temperature difference',
	pressure: 'a pressure',
	specificVolume: 'a specific volume',
	density: 'a density',
	specificEnergy: 'an energy per unit mass',
	specificEntropy: 'an entropy or heat capacity per unit mass',
	mass: 'a mass',
	volume: 'a volume',
	massFlow: 'a mass flow',
	energy: 'an energy',
	power: 'a power',
	speed: 'a speed',
	quality: 'a quality (0 to 1)',
	fraction: 'a fraction (0 to 1)',
	viscosity: 'a dynamic viscosity',
	thermalConductivity: 'a thermal conductivity',
	surfaceTension: 'a surface tension',
	dimensionless: 'a dimensionless number'
};

const POSITIVE: ReadonlySet<Quantity> = new Set([
	'specificVolume',
	'density',
	'mass',
	'volume',
	'massFlow',
	'viscosity',
	'thermalConductivity',
	'surfaceTension'
]);

// mantissa, then an optional exponent: e5, ×10^5, x10^-5, *10^5, or ×10⁻⁵ (which NFKC turns into ×10-5)
const NUMBER =
	/^([+\-−]?(?:\d+(?:\.\d*)?|\.\d+))(?:[eE]([+\-−]?\d+)|\s*[×x*]\s*10\^?([+\-−]?\d+))?/;

function fail(code: ParseErrorCode, message: string): ParseResult {
	return { ok: false, error: { code, message } };
}

const fmt = (x: number) => formatNumber(x, { sig: 6 });

/**
 * Read a typed value with its unit into SI base units, e.g. "250 kPa g", "3.5 bar", "120 °C",
 * "1.2e5 Pa", "200 psig", "−5 K" for a temperature difference. Decimal point only; a comma is
 * refused (it is a decimal comma in some countries and a thousands separator in others).
 * A pressure unit typed without a or g is read as `bareReference` (default absolute) and the
 * result says so (`assumed: 'reference'`), so the screen can show which it took.
 */
export function parseQuantity(
	input: string,
	quantity: Quantity,
	options: ParseOptions = {}
): ParseResult {
	const atmosphere = options.atmosphere ?? DEFAULT_ATMOSPHERE;
	const text = input.normalize('NFKC').trim();
	const example = EXAMPLES[quantity];
	if (text === '') return fail('empty', `Enter ${NAMES[quantity]}, for example ${example}.`);
	if (/\d,\d/.test(text))
		return fail(
			'decimal-comma',
			`Use a decimal point and no thousands separators: "${text.replace(/,/g, '.')}" rather than "${text}".`
		);
	const m = NUMBER.exec(text);
	if (!m)
		return fail(
			'not-a-number',
			`"${text}" does not start with a number. Give ${NAMES[quantity]} such as ${example}.`
		);
	const exponent = m[2] ?? m[3];
	const number = Number(`${m[1]}e${exponent ?? '0'}`.replace(/−/g, '-'));
	if (!Number.isFinite(number))
		return fail(
			'not-a-number',
			`"${text}" is too large a number. Give ${NAMES[quantity]} such as ${example}.`
		);
	const unitText = text.slice(m[0].length).trim();

	let unit: UnitDef;
	let assumed: 'unit' | 'reference' | undefined;
	if (unitText === '') {
		if (options.defaultUnit === undefined) {
			const bareNumberOk = quantity === 'quality' || quantity === 'fraction';
			if (!bareNumberOk) return fail('no-unit', `Add a unit to ${text}, for example ${example}.`);
			unit = unitById(quantity === 'quality' ? 'x1' : 'f1');
		} else {
			unit =
				typeof options.defaultUnit === 'string'
					? unitById(options.defaultUnit)
					: options.defaultUnit;
			if (unit.quantity !== quantity)
				throw new Error(`defaultUnit ${unit.id} is not a ${quantity} unit`);
			assumed = 'unit';
		}
	} else {
		const bare = quantity === 'pressure' ? bareBase(unitText) : undefined;
		if (bare) {
			const reference = options.bareReference ?? 'absolute';
			unit = unitById(`${bare}_${reference === 'gauge' ? 'g' : 'a'}`);
			assumed = 'reference';
		} else {
			const found = lookupUnit(unitText, quantity);
			if (found.length === 0) {
				const elsewhere = bareBase(unitText) ? 'pressure' : lookupUnit(unitText)[0]?.quantity;
				if (elsewhere) {
					const what = NAMES[elsewhere].replace(/^an? /, '');
					return fail(
						'wrong-quantity',
						`${unitText} is a unit of ${what}; this field takes ${NAMES[quantity]}, for example ${example}.`
					);
				}
				const known = [
					...new Set(
						unitsOf(quantity)
							.map((u) => u.label)
							.filter(Boolean)
					)
				].join(', ');
				return fail(
					'unknown-unit',
					`"${unitText}" is not a unit Statewright knows for ${NAMES[quantity]}. Use one of: ${known}.`
				);
			}
			unit = found[0];
		}
	}

	const si = unit.toSI(number, atmosphere);
	if (quantity === 'temperature' && !(si > 0))
		return fail(
			'below-absolute-zero',
			`${text} is at or below absolute zero (0 K = −273.15 °C = −459.67 °F). Give a temperature above it.`
		);
	if (quantity === 'pressure' && !(si > 0)) {
		let floor = ' An absolute pressure is above zero.';
		if (unit.reference === 'gauge') {
			const abs = unitById(unit.id.replace(/_g$/, '_a'));
			floor = ` With the sheet's atmospheric pressure of ${fmt(abs.fromSI(atmosphere, atmosphere))} ${abs.label}, gauge readings start at ${fmt(unit.fromSI(0, atmosphere))} ${unit.label}.`;
		}
		return fail('below-vacuum', `${text} is at or below a perfect vacuum.${floor}`);
	}
	if (POSITIVE.has(quantity) && !(si > 0))
		return fail(
			'not-positive',
			`${text} must be above zero. Give ${NAMES[quantity]} such as ${example}.`
		);
	if ((quantity === 'quality' || quantity === 'fraction') && (si < 0 || si > 1))
		return fail(
			'out-of-range',
			`${text} is outside 0 to 1 (0 % to 100 %). Give ${NAMES[quantity]}, for example ${example}.`
		);
	return assumed ? { ok: true, si, number, unit, assumed } : { ok: true, si, number, unit };
}

/** The bare pressure base ("kPa", "psi", …) a unit text names without a or g, if it does. */
function bareBase(unitText: string): string | undefined {
	const key = normaliseUnitText(unitText);
	if (key in BARE_PRESSURE) return BARE_PRESSURE[key];
	const folded = Object.keys(BARE_PRESSURE).find((k) => k.toLowerCase() === key.toLowerCase());
	return folded ? BARE_PRESSURE[folded] : undefined;
}
