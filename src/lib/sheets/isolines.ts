/**
 * Which background isolines a sheet draws (isobars on T–v and isotherms on P–v unless the sheet
 * chose others; see views.ts in $lib/charts for what each view offers), at round values
 * of the sheet's display unit (kPa, bar, MPa or psi; °C or °F) spread over the pressures and
 * temperatures the dome and the path span. Values are returned in SI for the isolines endpoint.
 */
import { displayUnit, type UnitPrefs } from '$lib/units/prefs';
import type { UnitDef } from '$lib/units/catalogue';
import type { IsolineKind } from '$lib/thermo/types';

export interface Span {
	/** SI: Pa absolute or K */
	min: number;
	max: number;
}

const MAX_LINES = 9;

/** 1-2-5 values per decade between lo and hi (display numbers), thinned to at most `max`. */
export function logRoundValues(lo: number, hi: number, max = MAX_LINES): number[] {
	if (!(lo > 0) || !(hi > lo)) return [];
	const within = (mantissas: number[]) => {
		const out: number[] = [];
		for (let e = Math.floor(Math.log10(lo)); e <= Math.ceil(Math.log10(hi)); e++)
			for (const m of mantissas) {
				const v = Number(`${m}e${e}`);
				if (v >= lo * (1 - 1e-9) && v <= hi * (1 + 1e-9)) out.push(v);
			}
		return out;
	};
	for (const mantissas of [[1, 2, 5], [1, 3], [1]]) {
		const out = within(mantissas);
		if (out.length <= max) return out;
	}
	// more decades than lines: every k-th decade
	const decades = within([1]);
	const k = Math.ceil(decades.length / max);
	return decades.filter((_, i) => i % k === 0);
}

/** Multiples of a round step (10, 20, 25, 50, 100, 200 …) between lo and hi, at most `max` of them. */
export function linearRoundValues(lo: number, hi: number, max = MAX_LINES): number[] {
	if (!(hi > lo)) return [];
	const steps = [1, 2, 2.5, 5];
	for (let e = Math.floor(Math.log10((hi - lo) / max)) - 1; e < 12; e++) {
		for (const m of steps) {
			const step = m * 10 ** e;
			const first = Math.ceil(lo / step - 1e-9);
			const last = Math.floor(hi / step + 1e-9);
			if (last - first + 1 <= max && last >= first) {
				const out: number[] = [];
				for (let i = first; i <= last; i++) out.push(Number((i * step).toPrecision(12)));
				return out;
			}
		}
	}
	return [];
}

/**
 * Isobar values (Pa absolute) for a T–v chart, round in the unit the chart labels them in: the
 * sheet's pressure unit, absolute — or gauge on a sheet that shows gauge pressures, where the
 * lines sit at round gauge readings (1, 2, 5, 10 bar g …) and none is drawn below atmospheric.
 */
export function isobarValues(span: Span, prefs: UnitPrefs): number[] {
	const gauge = prefs.pressureReference === 'gauge';
	const unit = displayUnit('pressure', prefs, { magnitude: span.max });
	const atm = prefs.atmosphere;
	const lo = gauge
		? Math.max(unit.fromSI(Math.max(span.min, atm), atm), unit.fromSI(atm * 1.01, atm))
		: unit.fromSI(span.min, atm);
	const hi = unit.fromSI(span.max, atm) * 1.5;
	// gauge readings far below the top are all "about atmospheric": start 2.5 decades down
	return logRoundValues(gauge ? Math.max(lo, hi / 300) : lo * 1.05, hi).map((d) =>
		exactSI(d, unit, atm)
	);
}

/**
 * The SI value nearest `display` whose conversion back gives `display` exactly, so a chart label
 * reads "0 °F" and not "−4×10⁻¹³ °F" (0 °F is 255.372… K, which no double holds exactly).
 */
export function exactSI(display: number, unit: UnitDef, atmosphere: number): number {
	const si = unit.toSI(display, atmosphere);
	if (unit.fromSI(si, atmosphere) === display) return si;
	const buf = new Float64Array(1);
	const bits = new BigInt64Array(buf.buffer);
	for (let k = 1; k <= 64; k++)
		for (const dir of [1n, -1n]) {
			buf[0] = si;
			bits[0] += dir * BigInt(k);
			if (unit.fromSI(buf[0], atmosphere) === display) return buf[0];
		}
	return si;
}

/** Isotherm values (K) for a P–v chart: round °C or °F across `span`, at most seven (they crowd where they converge). */
export function isothermValues(span: Span, prefs: UnitPrefs): number[] {
	const unit = displayUnit('temperature', prefs);
	const lo = unit.fromSI(span.min, prefs.atmosphere);
	const hi = unit.fromSI(span.max, prefs.atmosphere);
	const pad = (hi - lo) * 0.05;
	return linearRoundValues(lo + pad, hi + pad * 3, 7).map((d) =>
		exactSI(d, unit, prefs.atmosphere)
	);
}

/** The spans a sheet's background lines cover, SI: P Pa absolute, T K, v m³/kg, h J/kg, s J/(kg·K). */
export interface LineSpans {
	P: Span;
	T: Span;
	v: Span;
	h: Span;
	s: Span;
}

interface SpanFluid {
	triple: { T: number; P: number };
	critical: { T: number; P: number };
	limits: { Tmax: number; Pmax: number };
}
interface SpanState {
	T: number;
	P: number;
	v: number;
	h: number;
	s: number;
}

/**
 * What the lines span: pressures and temperatures as before (triple point to above the critical
 * point or the path), v from the critical volume to the path's largest (at most the vapor's at
 * the lowest saturation temperature), h and s over the dome and the path.
 */
export function lineSpans(
	f: SpanFluid,
	dome: { liquid: SpanState[]; vapor: SpanState[]; critical: SpanState } | null,
	states: readonly SpanState[]
): LineSpans {
	const maxP = Math.max(f.critical.P, ...states.map((s) => s.P));
	const minP = Math.min(f.triple.P * 2, ...states.map((s) => s.P));
	const maxT = Math.max(f.critical.T, ...states.map((s) => s.T));
	const domeStates = dome ? [...dome.liquid, ...dome.vapor] : [];
	const all = [...domeStates, ...states];
	const ext = (k: 'h' | 's') => {
		const vals = all.map((s) => s[k]).filter(Number.isFinite);
		return vals.length ? { min: Math.min(...vals), max: Math.max(...vals) } : { min: 0, max: 0 };
	};
	const vc = dome?.critical.v ?? Math.min(...states.map((s) => s.v));
	const vTop = Math.max(vc * 100, ...states.map((s) => s.v * 2));
	return {
		P: { min: minP, max: Math.min(maxP * 1.5, f.limits.Pmax) },
		T: { min: f.triple.T, max: Math.min(maxT * 1.08, f.limits.Tmax) },
		v: { min: vc, max: dome ? Math.min(vTop, dome.vapor[0]?.v ?? vTop) : vTop },
		h: ext('h'),
		s: ext('s')
	};
}

/** The nine quality lines drawn inside the dome. */
export const QUALITY_VALUES: readonly number[] = [0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9];

/**
 * Values (SI) of the background lines of one kind, round in the sheet's display unit: isobars
 * and isotherms as above, isochores at 1-2-5 steps of the v unit, isentropes and isenthalps at
 * round steps of the s and h units (at most eight), quality lines at x = 0.1 … 0.9.
 */
export function lineValues(kind: IsolineKind, spans: LineSpans, prefs: UnitPrefs): number[] {
	const atm = prefs.atmosphere;
	switch (kind) {
		case 'isobar':
			return isobarValues(spans.P, prefs);
		case 'isotherm':
			return isothermValues(spans.T, prefs);
		case 'quality':
			return [...QUALITY_VALUES];
		case 'isochore': {
			const unit = displayUnit('specificVolume', prefs);
			return logRoundValues(
				unit.fromSI(spans.v.min, atm) * 1.05,
				unit.fromSI(spans.v.max, atm),
				7
			).map((d) => exactSI(d, unit, atm));
		}
		default: {
			const span = kind === 'isentrope' ? spans.s : spans.h;
			const unit = displayUnit(kind === 'isentrope' ? 'specificEntropy' : 'specificEnergy', prefs);
			const lo = unit.fromSI(span.min, atm);
			const hi = unit.fromSI(span.max, atm);
			const pad = (hi - lo) * 0.04;
			return linearRoundValues(lo + pad, hi - pad, 8).map((d) => exactSI(d, unit, atm));
		}
	}
}
