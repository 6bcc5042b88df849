import { unitById, type PressureReference, type Quantity, type UnitDef } from './catalogue';
import { displayUnit, type UnitPrefs } from './prefs';

export interface NumberFormat {
	/** significant figures (default 5) … */
	sig?: number;
	/** … or a fixed number of decimals, which wins when given */
	decimals?: number;
	/** `unicode` (default) prints − and ×10⁻⁵; `ascii` prints - and e-5 (for CSV and inputs) */
	style?: 'unicode' | 'ascii';
}

/** No-break space between a number and its unit. */
export const NBSP = '\u00a0';

const SUPERSCRIPT: Record<string, string> = {
	'0': '⁰',
	'1': '¹',
	'2': '²',
	'3': '³',
	'4': '⁴',
	'5': '⁵',
	'6': '⁶',
	'7': '⁷',
	'8': '⁸',
	'9': '⁹',
	'-': '⁻'
};

/** Magnitudes shown without an exponent: 10⁻⁴ ≤ |v| < 10⁷. Outside, an exponent is clearer. */
const PLAIN_MIN = 1e-4;
const PLAIN_MAX = 1e7;

function minus(text: string, style: 'unicode' | 'ascii'): string {
	return style === 'unicode' ? text.replace(/^-/, '−') : text;
}

/** "10⁻⁵" or "e-5" */
export function exponentText(exp: number, style: 'unicode' | 'ascii' = 'unicode'): string {
	if (style === 'ascii') return `e${exp}`;
	return (
		'×10' +
		String(exp)
			.split('')
			.map((c) => SUPERSCRIPT[c] ?? c)
			.join('')
	);
}

/**
 * A number as text with sensible precision: fixed decimals, or significant figures in plain
 * notation for ordinary magnitudes (no "1.2e+3"), with an exponent only outside 10⁻⁴…10⁷.
 */
export function formatNumber(value: number, format: NumberFormat = {}): string {
	const style = format.style ?? 'unicode';
	if (!Number.isFinite(value)) return '—';
	if (format.decimals !== undefined) {
		const t = value.toFixed(format.decimals);
		return minus(/^-0(\.0*)?$/.test(t) ? t.slice(1) : t, style);
	}
	const sig = Math.max(1, Math.min(17, format.sig ?? 5));
	if (value === 0) return '0';
	const abs = Math.abs(value);
	if (abs >= PLAIN_MIN && abs < PLAIN_MAX) {
		const rounded = Number(value.toPrecision(sig));
		const mag = Math.floor(Math.log10(Math.abs(rounded)));
		if (Math.abs(rounded) < PLAIN_MAX)
			return minus(rounded.toFixed(Math.max(0, sig - 1 - mag)), style);
	}
	const [mant, exp] = value.toExponential(sig - 1).split('e');
	return minus(mant, style) + exponentText(Number(exp), style);
}

/** Default precision by quantity: temperatures to 0.01, quality to 4 decimals, else 5 significant. */
export function defaultFormat(quantity: Quantity, unit: UnitDef): NumberFormat {
	switch (quantity) {
		case 'temperature':
		case 'temperatureDifference':
			return { decimals: 2 };
		case 'quality':
			return unit.label === '%' ? { decimals: 2 } : { decimals: 4 };
		case 'fraction':
			return unit.label === '%' ? { decimals: 2 } : { decimals: 4 };
		default:
			return { sig: 5 };
	}
}

export interface Formatted {
	/** the number in `unit` */
	value: number;
	/** the number as text */
	text: string;
	unit: UnitDef;
	/** text, a no-break space and the unit label ("180.00 °C", "1.0000 MPa g") */
	full: string;
}

export interface QuantityFormat extends NumberFormat {
	/** a unit (object or id) instead of the preference's */
	unit?: UnitDef | string;
	/** pressure only: absolute or gauge instead of the preference */
	reference?: PressureReference;
}

/** An SI value formatted in the preference's display unit (or `format.unit`). */
export function formatQuantity(
	si: number,
	quantity: Quantity,
	prefs: UnitPrefs,
	format: QuantityFormat = {}
): Formatted {
	const unit =
		format.unit === undefined
			? displayUnit(quantity, prefs, { reference: format.reference })
			: typeof format.unit === 'string'
				? unitById(format.unit)
				: format.unit;
	const value = unit.fromSI(si, prefs.atmosphere);
	const numberFormat =
		format.sig !== undefined || format.decimals !== undefined
			? format
			: { ...defaultFormat(quantity, unit), style: format.style };
	const text = formatNumber(value, numberFormat);
	return { value, text, unit, full: unit.label ? `${text}${NBSP}${unit.label}` : text };
}
