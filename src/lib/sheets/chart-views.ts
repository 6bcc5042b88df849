/**
 * Which views a sheet shows and which background lines each draws, from its chart preferences
 * (types.ts). Pure; the views themselves are data in $lib/charts/views.
 */
import { isChartKind, VIEW_ORDER, VIEWS, type ChartKind } from '$lib/charts/views';
import type { IsolineKind } from '$lib/charts/types';
import type { ChartPrefs, ChartView, LineKind } from './types';

export const LINE_KINDS: readonly LineKind[] = [
	'isobar',
	'isotherm',
	'isochore',
	'isentrope',
	'isenthalp',
	'quality'
];

/** Every value `chart.view` may take: each view alone, "both", and each ordered pair. */
export const CHART_VIEW_VALUES: readonly ChartView[] = [
	...VIEW_ORDER,
	'both',
	...VIEW_ORDER.flatMap((a) =>
		VIEW_ORDER.filter((b) => b !== a).map((b) => `${a}+${b}` as ChartView)
	)
];

/** The views a sheet shows, in order. */
export function chartKinds(view: ChartView): ChartKind[] {
	if (view === 'both') return ['T-v', 'P-v'];
	const kinds = view.split('+').filter(isChartKind);
	return kinds.length ? kinds : ['T-v', 'P-v'];
}

/** The stored name of one or two views (T–v with P–v stays "both"). */
export function chartViewOf(kinds: readonly ChartKind[]): ChartView {
	const k = kinds.slice(0, 2);
	if (k.length === 2 && k[0] === 'T-v' && k[1] === 'P-v') return 'both';
	return k.join('+') as ChartView;
}

/**
 * The views after the designer presses one: a shown view is hidden (unless it is the only one);
 * a hidden one is shown beside the most recently chosen, the other giving way.
 */
export function toggleView(view: ChartView, kind: ChartKind): ChartView {
	const shown = chartKinds(view);
	if (shown.includes(kind))
		return shown.length > 1 ? chartViewOf(shown.filter((k) => k !== kind)) : view;
	const keep = shown[shown.length - 1];
	return chartViewOf(VIEW_ORDER.filter((k) => k === keep || k === kind) as ChartKind[]);
}

/** The background lines drawn on one view. */
export function viewLines(chart: ChartPrefs, kind: ChartKind): IsolineKind[] {
	if (!chart.isolines) return [];
	const v = VIEWS[kind];
	const on = chart.lines ?? v.defaultLines;
	return v.lines.filter((k) => on.includes(k));
}

/** Kinds drawn on any shown view (what to ask the engine for). */
export function shownLines(chart: ChartPrefs): IsolineKind[] {
	const kinds = chartKinds(chart.view);
	return LINE_KINDS.filter((l) => kinds.some((k) => viewLines(chart, k).includes(l)));
}

/** Kinds a shown view could draw (the switches offered). */
export function offeredLines(chart: ChartPrefs): IsolineKind[] {
	const kinds = chartKinds(chart.view);
	return LINE_KINDS.filter((l) => kinds.some((k) => VIEWS[k].lines.includes(l)));
}

/** The line set after switching one kind on or off (starting from what is drawn now). */
export function toggleLine(chart: ChartPrefs, kind: LineKind, on: boolean): LineKind[] {
	const now = new Set<LineKind>(chart.lines ?? shownLines({ ...chart, isolines: true }));
	if (on) now.add(kind);
	else now.delete(kind);
	return LINE_KINDS.filter((k) => now.has(k));
}
