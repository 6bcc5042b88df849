/**
 * Published check values kept as data beside each fluid (`<id>.checks.ts`), run by one generic test
 * (published-checks.test.ts). Every table names the publication and table its numbers come from, and
 * the public copy of them that was used. Values are strings as printed, so the test knows the
 * printed precision: a computed value must agree within half a unit in the last printed digit
 * (`2148e1` means 21480 printed to tens), or within `rel` where a table says why it needs one.
 * An empty string is a cell the table leaves blank.
 *
 * Columns name a property and its unit, `'<property> [<unit>]'`:
 * - properties of a single-phase state (inputs `T-rho`, `T-P`): T, P, rho, u, h, s, cv, cp, w
 * - of a saturated pair (input `T-sat`, at the row's T; `P-sat`, at the row's P): T, P and the
 *   same with L (saturated liquid) or V (saturated vapor) appended: rhoL, hV, cpL…
 */
export const CHECK_UNITS = {
	K: 1,
	degC: 1,
	MPa: 1e6,
	kPa: 1e3,
	Pa: 1,
	bar: 1e5,
	'kg/m3': 1,
	'mol/dm3': 'molar-density',
	'kJ/kg': 1e3,
	'kJ/(kg K)': 1e3,
	'J/mol': 'molar',
	'kJ/mol': 'molar-k',
	'J/(mol K)': 'molar',
	'kJ/(mol K)': 'molar-k',
	'm/s': 1
} as const;

export type CheckUnit = keyof typeof CHECK_UNITS;

export interface CheckTable {
	/** publication, table (and page), and the public copy of its numbers that was used */
	source: string;
	/** how each row's state is fixed: from its T and ρ, its T and P, or saturation at its T or P */
	input: 'T-rho' | 'T-P' | 'T-sat' | 'P-sat';
	/** `'<property> [<unit>]'`, e.g. `'P [MPa]'`, `'cpL [kJ/(kg K)]'` */
	columns: string[];
	rows: string[][];
	/**
	 * How printed u, h and s compare: `absolute` when the table uses the fluid's declared reference
	 * state; `differences` when it uses another convention: each value less the first row's value of the
	 * same energy (its first such column: h′ for both h′ and h″), against the same difference printed.
	 */
	energies: 'absolute' | 'differences';
	/** relative slack accepted beyond the printed digits, with the reason (default none) */
	rel?: { value: number; why: string };
}

export interface FluidChecks {
	fluid: string;
	/** published critical point the equation passes through (P at T, ρ to its printed digits, or within rel) */
	critical?: {
		source: string;
		T: string;
		P: string;
		rho: string;
		units: [CheckUnit, CheckUnit, CheckUnit];
		rel?: number;
	};
	/** normal boiling point, K, as printed */
	normalBoilingPoint?: { source: string; T: string };
	tables: CheckTable[];
}
