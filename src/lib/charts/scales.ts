import {
	scaleLinear,
	scaleLog,
	tickStep,
	ticks as linearTickValues,
	type ScaleContinuousNumeric
} from 'd3';
import { displayUnit, exponentText, formatNumber, type UnitDef, type UnitPrefs } from '$lib/units';
import { axisScaleType, VIEWS, type ViewProp } from './views';
import type {
	ChartKind,
	ChartLeg,
	ChartState,
	DesignLimits,
	Domain,
	PressureScale,
	SaturationCurve,
	TriplePoint
} from './types';

export type Scale = ScaleContinuousNumeric<number, number>;

/** One tick: `value` is SI (where it sits), `display` the number in the axis unit, `label` '' for minor ticks. */
export interface Tick {
	value: number;
	display: number;
	label: string;
	major: boolean;
}

/** How the y axis of a chart kind is scaled. */
export function yScaleType(kind: ChartKind, pressureScale: PressureScale): 'log' | 'linear' {
	return axisScaleType(VIEWS[kind].y, pressureScale);
}

/** How the x axis of a chart kind is scaled (log v; h and s linear). */
export function xScaleType(kind: ChartKind, pressureScale: PressureScale): 'log' | 'linear' {
	return axisScaleType(VIEWS[kind].x, pressureScale);
}

export function makeXScale(domain: Domain, width: number, type: 'log' | 'linear' = 'log'): Scale {
	return (type === 'log' ? scaleLog() : scaleLinear()).domain(domain.x).range([0, width]);
}

export function makeYScale(
	kind: ChartKind,
	pressureScale: PressureScale,
	domain: Domain,
	height: number
): Scale {
	return (yScaleType(kind, pressureScale) === 'log' ? scaleLog() : scaleLinear())
		.domain(domain.y)
		.range([height, 0]);
}

/**
 * The unit an axis is labelled in. v in the system's specific-volume unit; T in °C or °F;
 * P in the preferred pressure unit, absolute on a log axis (gauge values can be zero or
 * negative, which a log axis cannot show), else the preferred reference.
 */
export function axisUnit(
	axis: ViewProp,
	prefs: UnitPrefs,
	pressureScale: PressureScale,
	domainSI?: [number, number]
): UnitDef {
	if (axis === 'v') return displayUnit('specificVolume', prefs);
	if (axis === 'h') return displayUnit('specificEnergy', prefs);
	if (axis === 's') return displayUnit('specificEntropy', prefs);
	if (axis === 'T') return displayUnit('temperature', prefs);
	return displayUnit('pressure', prefs, {
		reference: pressureScale === 'log' ? 'absolute' : prefs.pressureReference,
		magnitude: domainSI
	});
}

const LOG_PAD = 0.12; // decades added at each end of a log axis
const LIN_PAD = 0.06; // fraction of the span added at each end of a linear axis

function extent(values: Iterable<number>): [number, number] | null {
	let lo = Infinity;
	let hi = -Infinity;
	for (const v of values) {
		if (!Number.isFinite(v)) continue;
		if (v < lo) lo = v;
		if (v > hi) hi = v;
	}
	return lo <= hi ? [lo, hi] : null;
}

function padLog([lo, hi]: [number, number], pad = LOG_PAD): [number, number] {
	const a = Math.log10(lo);
	const b = Math.log10(hi);
	const extra = b - a < 0.5 ? (0.5 - (b - a)) / 2 : 0;
	return [10 ** (a - pad - extra), 10 ** (b + pad + extra)];
}

function padLinear([lo, hi]: [number, number], floor?: number): [number, number] {
	const span = hi - lo || Math.abs(hi) * 0.1 || 1;
	const a = lo - span * LIN_PAD;
	return [floor !== undefined ? Math.max(floor, a) : a, hi + span * LIN_PAD];
}

export interface DomainInputs {
	saturation?: SaturationCurve | null;
	triple?: TriplePoint | null;
	states?: readonly ChartState[];
	legs?: readonly ChartLeg[];
	limits?: DesignLimits | null;
}

function* pointsOf(inputs: DomainInputs) {
	const sat = inputs.saturation;
	if (sat) {
		yield* sat.liquid;
		yield* sat.vapor;
		yield sat.critical;
	}
	for (const s of inputs.states ?? []) yield s.state;
	for (const l of inputs.legs ?? []) yield* l.points;
}

/**
 * The window a chart opens on (and double-click returns to): the dome, the path and the design
 * limits, padded; log axes (v, log P) by a fraction of a decade, linear ones (T, h, s, linear P)
 * by a share of the span. Linear pressure starts at zero absolute at the lowest; T no lower than
 * 10 K under the triple point.
 */
export function fitDomain(
	kind: ChartKind,
	pressureScale: PressureScale,
	inputs: DomainInputs
): Domain {
	const view = VIEWS[kind];
	const pts = [...pointsOf(inputs)];
	const lim = inputs.limits ?? {};
	const limitValues: Partial<Record<ViewProp, number[]>> = {
		T: [lim.designTemperature?.value, lim.minimumTemperature?.value].filter(
			(t): t is number => t !== undefined
		),
		P: [lim.designPressure?.value, lim.reliefSetPressure?.value].filter(
			(p): p is number => p !== undefined
		)
	};
	const axis = (prop: ViewProp, type: 'log' | 'linear', withLimits: boolean): [number, number] => {
		const values = [...pts.map((p) => p[prop]), ...(withLimits ? (limitValues[prop] ?? []) : [])];
		if (prop === 'v') {
			const v = extent(values.filter((x) => x > 0));
			return v ? padLog(v) : [1e-3, 10];
		}
		if (prop === 'T') {
			const T = extent(values);
			const floor = inputs.triple ? inputs.triple.T - 10 : 0;
			return T ? padLinear(T, Math.max(0, floor)) : [273.15, 673.15];
		}
		if (prop === 'P') {
			const P = extent(values.filter((p) => p > 0));
			if (type === 'log') return P ? padLog(P) : [1e3, 1e7];
			return P ? padLinear([0, P[1]], 0) : [0, 1e7];
		}
		const e = extent(values);
		return e ? padLinear(e) : prop === 'h' ? [0, 3e6] : [0, 1e4];
	};
	// limits widen the y axis only, as on the first two views (a limit is a rule across it there)
	return {
		x: axis(view.x.prop, xScaleType(kind, pressureScale), false),
		y: axis(view.y.prop, yScaleType(kind, pressureScale), true)
	};
}

/** Trim a tick label: "500.0" → "500", "0.250" → "0.25". */
export function compactNumber(value: number, sig = 4): string {
	const t = formatNumber(value, { sig });
	return t.includes('×') || !t.includes('.') ? t : t.replace(/\.?0+$/, '');
}

/**
 * Ticks for a linear axis, placed at round numbers of the display unit (°C, °F, kPa g …) and
 * positioned in SI. Majors are labelled with just enough decimals for the step; four minor
 * ticks (or one, for a step of 2·10ⁿ) fall between.
 */
export function linearTicks(
	domainSI: [number, number],
	unit: UnitDef,
	atmosphere: number,
	count = 7
): Tick[] {
	const d0 = unit.fromSI(domainSI[0], atmosphere);
	const d1 = unit.fromSI(domainSI[1], atmosphere);
	const [lo, hi] = d0 <= d1 ? [d0, d1] : [d1, d0];
	const step = tickStep(lo, hi, count);
	if (!(step > 0) || !Number.isFinite(step)) return [];
	const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
	const majors = linearTickValues(lo, hi, count);
	const mantissa = Math.round(step / 10 ** Math.floor(Math.log10(step) + 1e-9));
	const minorStep = step / (mantissa === 2 ? 2 : 5);
	const out: Tick[] = [];
	const first = Math.ceil(lo / minorStep - 1e-9);
	const last = Math.floor(hi / minorStep + 1e-9);
	for (let i = first; i <= last; i++) {
		const display = Number((i * minorStep).toFixed(decimals + 2));
		const major = majors.some((m) => Math.abs(m - display) < minorStep * 1e-6);
		out.push({
			value: unit.toSI(display, atmosphere),
			display,
			label: major ? formatNumber(display, { decimals }) : '',
			major
		});
	}
	return out;
}

/** A decade label: plain for 10⁻⁴…10⁵ ("0.001", "2000"), a power of ten outside ("10⁻⁵", "2×10⁶"). */
export function decadeLabel(exp: number, mantissa = 1): string {
	if (exp >= -4 && exp <= 5)
		return formatNumber(Number(`${mantissa}e${exp}`), { decimals: Math.max(0, -exp) });
	return mantissa === 1 ? exponentText(exp).slice(1) : `${mantissa}${exponentText(exp)}`;
}

/**
 * Ticks for a log axis in the display unit: a labelled major at each power of ten and minors at
 * 2…9 × 10ⁿ. Where fewer than two powers of ten are in view, 2 and 5 × 10ⁿ are labelled too, and
 * where that still gives fewer than two labels (or the window spans under a third of a decade)
 * every tick is labelled.
 */
export function logTicks(domainSI: [number, number], unit: UnitDef, atmosphere: number): Tick[] {
	const d0 = unit.fromSI(domainSI[0], atmosphere);
	const d1 = unit.fromSI(domainSI[1], atmosphere);
	const lo = Math.min(d0, d1);
	const hi = Math.max(d0, d1);
	if (!(lo > 0) || !Number.isFinite(hi)) return [];
	const e0 = Math.floor(Math.log10(lo));
	const e1 = Math.ceil(Math.log10(hi));
	const span = Math.log10(hi) - Math.log10(lo);
	const candidates: { display: number; exp: number; m: number }[] = [];
	for (let e = e0; e <= e1; e++) {
		for (let m = 1; m <= 9; m++) {
			const display = Number(`${m}e${e}`);
			if (display >= lo * (1 - 1e-12) && display <= hi * (1 + 1e-12))
				candidates.push({ display, exp: e, m });
		}
	}
	const decades = candidates.filter((c) => c.m === 1).length;
	let labelled = (m: number) => m === 1 || (decades < 2 && (m === 2 || m === 5));
	if (span < 1 / 3 || candidates.filter((c) => labelled(c.m)).length < 2) labelled = () => true;
	return candidates.map(({ display, exp, m }) => {
		const major = labelled(m);
		return {
			value: unit.toSI(display, atmosphere),
			display,
			label: major ? decadeLabel(exp, m) : '',
			major
		};
	});
}

/** Ticks for either scale type. */
export function axisTicks(
	type: 'log' | 'linear',
	domainSI: [number, number],
	unit: UnitDef,
	atmosphere: number,
	count?: number
): Tick[] {
	return type === 'log'
		? logTicks(domainSI, unit, atmosphere)
		: linearTicks(domainSI, unit, atmosphere, count);
}

/**
 * Drop labels that would crowd their neighbours on screen: walking in order, a label is kept
 * only if it starts `minGap` px after the last kept one ends (labels `widthOf` px wide, centred).
 */
export function thinLabels(
	ticks: Tick[],
	position: (si: number) => number,
	minGap: number,
	widthOf: (label: string) => number
): Tick[] {
	const majors = ticks
		.filter((t) => t.label !== '')
		.sort((a, b) => position(a.value) - position(b.value));
	let lastEnd = -Infinity;
	const keep = new Set<Tick>();
	for (const t of majors) {
		const p = position(t.value);
		const w = widthOf(t.label);
		if (p - w / 2 >= lastEnd + minGap) {
			keep.add(t);
			lastEnd = p + w / 2;
		}
	}
	return ticks.map((t) => (t.label === '' || keep.has(t) ? t : { ...t, label: '' }));
}
