/**
 * A temperature typed where a pressure is asked (or a pressure where a temperature is asked) means
 * "on the saturation line": 40 °C in a P cell is the saturation pressure at 40 °C, 1 bar a in a
 * T cell the saturation temperature at 1 bar a. The typed text is read as the other quantity and
 * converted with the engine's saturation functions (passed in: the browser loads the engine
 * lazily); the answer carries a sentence saying what was done, for the screen.
 */
import type { Saturation } from '$lib/thermo/types';
import { formatQuantity } from '$lib/units/format';
import { parseQuantity } from '$lib/units/parse';
import type { UnitPrefs } from '$lib/units/prefs';

export interface SaturationFns {
	saturationAtT(fluid: string, T: number): Saturation;
	saturationAtP(fluid: string, P: number): Saturation;
}

export type SaturationReading =
	{ ok: true; si: number; note: string } | { ok: false; message: string } | null;

/**
 * `typed` in a `column` ('T' or 'P') cell: null when it is not the other quantity (the caller
 * keeps its own error), else the saturation value in SI with a note, or why there is none.
 */
export function readAcrossSaturation(
	engine: SaturationFns,
	fluid: string,
	column: 'T' | 'P',
	typed: string,
	prefs: UnitPrefs
): SaturationReading {
	if (column === 'P') {
		const t = parseQuantity(typed, 'temperature', { atmosphere: prefs.atmosphere });
		if (!t.ok) return null;
		try {
			const sat = engine.saturationAtT(fluid, t.si);
			const T = formatQuantity(t.si, 'temperature', prefs).full;
			return {
				ok: true,
				si: sat.P,
				note: `${T} typed as a pressure: the saturation pressure at ${T}, ${formatQuantity(sat.P, 'pressure', prefs).full}.`
			};
		} catch (e) {
			return {
				ok: false,
				message: `${typed.trim()} is a temperature; read as "saturation pressure at ${typed.trim()}" there is none: ${(e as Error).message}`
			};
		}
	}
	const p = parseQuantity(typed, 'pressure', {
		atmosphere: prefs.atmosphere,
		bareReference: prefs.pressureReference
	});
	if (!p.ok) return null;
	try {
		const sat = engine.saturationAtP(fluid, p.si);
		const P = formatQuantity(p.si, 'pressure', prefs).full;
		return {
			ok: true,
			si: sat.T,
			note: `${P} typed as a temperature: the saturation temperature at ${P}, ${formatQuantity(sat.T, 'temperature', prefs).full}.`
		};
	} catch (e) {
		return {
			ok: false,
			message: `${typed.trim()} is a pressure; read as "saturation temperature at ${typed.trim()}" there is none: ${(e as Error).message}`
		};
	}
}
