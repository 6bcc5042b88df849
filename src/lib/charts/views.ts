/**
 * The five views of one sheet as data: which property of a state runs along each axis, how each
 * axis is scaled, the quantity its numbers are shown in, the background lines it can carry and
 * the pair of properties a pointer position there fixes. `chart.ts` draws any view from this.
 */
import type { Quantity } from '$lib/units';
import type { IsolineKind, PressureScale } from './types';

export type ChartKind = 'T-v' | 'P-v' | 'P-h' | 'T-s' | 'h-s';

/** A state property a view puts on an axis (SI: K, Pa absolute, m³/kg, J/kg, J/(kg·K)). */
export type ViewProp = 'T' | 'P' | 'v' | 'h' | 's';

/**
 * `log` and `linear` are fixed; `pressure` follows the sheet's pressure-scale choice (P–v only:
 * the P–h view always reads log P, as the trade does).
 */
export type AxisScale = 'log' | 'linear' | 'pressure';

export interface ViewAxis {
	prop: ViewProp;
	scale: AxisScale;
	quantity: Quantity;
	/** the word in the axis title */
	word: string;
}

export interface ChartView {
	id: ChartKind;
	x: ViewAxis;
	y: ViewAxis;
	/** "Temperature–specific volume" (section names, summaries) */
	name: string;
	/** the two properties a pointer position fixes (x, y), as the engine takes them */
	pair: [ViewProp, ViewProp];
	/** background lines that are not straight axis rules on this view, in the order offered */
	lines: readonly IsolineKind[];
	/** background lines drawn when the sheet has not chosen its own */
	defaultLines: readonly IsolineKind[];
}

const AXIS: Record<ViewProp, Omit<ViewAxis, 'scale'>> = {
	T: { prop: 'T', quantity: 'temperature', word: 'temperature' },
	P: { prop: 'P', quantity: 'pressure', word: 'pressure' },
	v: { prop: 'v', quantity: 'specificVolume', word: 'specific volume' },
	h: { prop: 'h', quantity: 'specificEnergy', word: 'specific enthalpy' },
	s: { prop: 's', quantity: 'specificEntropy', word: 'specific entropy' }
};

function view(
	id: ChartKind,
	x: [ViewProp, AxisScale],
	y: [ViewProp, AxisScale],
	lines: IsolineKind[],
	defaultLines: IsolineKind[]
): ChartView {
	const xa = { ...AXIS[x[0]], scale: x[1] };
	const ya = { ...AXIS[y[0]], scale: y[1] };
	const cap = (w: string) => w[0].toUpperCase() + w.slice(1);
	return {
		id,
		x: xa,
		y: ya,
		name: `${cap(ya.word)}–${xa.word}`,
		pair: [x[0], y[0]],
		lines,
		defaultLines
	};
}

export const VIEWS: Readonly<Record<ChartKind, ChartView>> = Object.freeze({
	'T-v': view(
		'T-v',
		['v', 'log'],
		['T', 'linear'],
		['isobar', 'isentrope', 'isenthalp', 'quality'],
		['isobar']
	),
	'P-v': view(
		'P-v',
		['v', 'log'],
		['P', 'pressure'],
		['isotherm', 'isentrope', 'isenthalp', 'quality'],
		['isotherm']
	),
	'P-h': view(
		'P-h',
		['h', 'linear'],
		['P', 'log'],
		['isotherm', 'isochore', 'isentrope', 'quality'],
		['isotherm', 'isentrope', 'quality']
	),
	'T-s': view(
		'T-s',
		['s', 'linear'],
		['T', 'linear'],
		['isobar', 'isochore', 'isenthalp', 'quality'],
		['isobar', 'isenthalp', 'quality']
	),
	'h-s': view(
		'h-s',
		['s', 'linear'],
		['h', 'linear'],
		['isobar', 'isotherm', 'quality'],
		['isobar', 'isotherm', 'quality']
	)
});

/** The order views are offered in. */
export const VIEW_ORDER: readonly ChartKind[] = ['T-v', 'P-v', 'P-h', 'T-s', 'h-s'];

export function isChartKind(v: unknown): v is ChartKind {
	return typeof v === 'string' && (VIEW_ORDER as readonly string[]).includes(v);
}

/** How an axis of a view is scaled on a sheet with this pressure-scale choice. */
export function axisScaleType(axis: ViewAxis, pressureScale: PressureScale): 'log' | 'linear' {
	return axis.scale === 'pressure' ? pressureScale : axis.scale;
}

/** The pair of engine inputs a position on a view stands for ({ P, h } on P–h …). */
export function pairInputs(
	kind: ChartKind,
	c: Partial<Record<ViewProp, number>>
): Partial<Record<ViewProp, number>> {
	const [a, b] = VIEWS[kind].pair;
	return { [a]: c[a], [b]: c[b] };
}
