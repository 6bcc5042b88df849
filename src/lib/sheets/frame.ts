import type {
	FluidInfo,
	DesignLimits as SpecLimits,
	IsolineKind,
	SaturationCurve,
	State
} from '$lib/thermo/types';
import type { UnitPrefs } from '$lib/units/prefs';
import { lineSpans, lineValues } from './isolines';
import { shownLines } from './chart-views';
import type { ChartPrefs } from './types';

/*
 * The chart's frame around a path — which background isolines and design-limit curves to draw —
 * decided once for the editor (which fetches the lines from the compute API) and the server's
 * read-only pages (which trace them with the engine directly).
 */

/** A point of a limit curve, SI; h and s where the views that need them are drawn. */
export interface LinePoint {
	T: number;
	P: number;
	v: number;
	h?: number;
	s?: number;
}

/** A traced line: its value (SI) and points. */
interface TracedLine {
	value: number;
	points: LinePoint[];
}

/**
 * One design limit, SI (pressures absolute, Pa; temperatures K). `points` is the limit's own
 * isobar (for a pressure limit on T–v) or isotherm (for a temperature limit on P–v); without
 * it that limit is not drawn on that diagram, because its curve cannot be drawn without the engine.
 */
export interface DesignLimit {
	value: number;
	points?: LinePoint[];
}

/** The design limits as the charts draw them. */
export interface DesignLimits {
	designPressure?: DesignLimit | null;
	reliefSetPressure?: DesignLimit | null;
	designTemperature?: DesignLimit | null;
	minimumTemperature?: DesignLimit | null;
}

/** The values (SI) of the lines a frame needs: background lines by kind and limit curves. */
export interface FrameLines {
	/** each background line kind the sheet's shown views draw, with its values */
	lines: Array<readonly [IsolineKind, number[]]>;
	limitIsobars: number[];
	limitIsotherms: number[];
}

/**
 * Background lines of every kind the sheet's shown views draw (sheets/chart-views.ts), at round
 * values in the sheet's units over what the path and the dome span (none when the sheet hides
 * isolines), and the curves of the design limits, all inside the fluid's range.
 */
export function frameLines(
	fluid: FluidInfo,
	doc: { units: UnitPrefs; chart: ChartPrefs; spec: { limits?: SpecLimits } },
	states: State[],
	saturation: SaturationCurve | null
): FrameLines {
	const f = fluid;
	const spans = lineSpans(f, saturation, states);
	const inRange = (kind: IsolineKind, v: number) =>
		kind === 'isobar'
			? v <= f.limits.Pmax
			: kind === 'isotherm'
				? v >= f.limits.Tmin && v <= f.limits.Tmax
				: true;
	const lines = shownLines(doc.chart).map(
		(kind) => [kind, lineValues(kind, spans, doc.units).filter((v) => inRange(kind, v))] as const
	);
	const lim = doc.spec.limits ?? {};
	const limitIsobars = [lim.designPressure, lim.reliefSetPressure].filter(
		(v): v is number => typeof v === 'number' && v <= f.limits.Pmax
	);
	const limitIsotherms = [lim.designTemperature, lim.minimumTemperature].filter(
		(v): v is number => typeof v === 'number' && v >= f.triple.T && v <= f.limits.Tmax
	);
	return { lines, limitIsobars, limitIsotherms };
}

/** The document's design limits with the curve each needs on the other diagram (when traced). */
export function frameLimits(
	limits: SpecLimits | undefined,
	curves: { isobars: TracedLine[]; isotherms: TracedLine[] }
): DesignLimits {
	const lim = limits ?? {};
	const curve = (list: TracedLine[], value: number): LinePoint[] | undefined =>
		list.find((l) => Math.abs(l.value / value - 1) < 1e-9)?.points;
	const out: DesignLimits = {};
	if (lim.designPressure !== undefined)
		out.designPressure = {
			value: lim.designPressure,
			points: curve(curves.isobars, lim.designPressure)
		};
	if (lim.reliefSetPressure !== undefined)
		out.reliefSetPressure = {
			value: lim.reliefSetPressure,
			points: curve(curves.isobars, lim.reliefSetPressure)
		};
	if (lim.designTemperature !== undefined)
		out.designTemperature = {
			value: lim.designTemperature,
			points: curve(curves.isotherms, lim.designTemperature)
		};
	if (lim.minimumTemperature !== undefined)
		out.minimumTemperature = {
			value: lim.minimumTemperature,
			points: curve(curves.isotherms, lim.minimumTemperature)
		};
	return out;
}
