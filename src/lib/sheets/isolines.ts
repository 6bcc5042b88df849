/**
 * Which background isolines a sheet draws: isobars on T–v and isotherms on P–v, at round values
 * of the sheet's display unit (kPa, bar, MPa or psi; °C or °F) spread over the pressures and
 * temperatures the dome and the path span. Values are returned in SI for the isolines endpoint.
 */
import { displayUnit, type UnitPrefs } from '$lib/units/prefs';
import type { UnitDef } from '$lib/units/catalogue';

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
