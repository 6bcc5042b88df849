/**
 * A closed system's start state by fill level: the liquid volume fraction φ = V′/V of a vessel
 * holding saturated liquid and vapor at a temperature (or pressure). With V′ = φV and V″ = (1 − φ)V,
 * the mass is m = ρ′φV + ρ″(1 − φ)V, so the mass-specific volume is
 *
 *     v = V / m = 1 / (φ ρ′ + (1 − φ) ρ″)
 *
 * (ρ′, ρ″ the saturated liquid and vapor densities at T). φ = 1 is saturated liquid, φ = 0
 * saturated vapor. Client-safe: the engine's saturation functions are passed in, so the browser
 * can keep loading the engine lazily.
 */
import type { Inputs, Saturation } from '$lib/thermo/types';
import { formatQuantity } from '$lib/units/format';
import { parseQuantity } from '$lib/units/parse';
import type { UnitPrefs } from '$lib/units/prefs';
import type { StartSpec } from './types';

export interface SaturationSource {
	saturationAtT(fluid: string, T: number): Saturation;
	saturationAtP(fluid: string, P: number): Saturation;
}

export type FillSpec = Extract<StartSpec, { kind: 'fill' }>;

/** Specific volume (m³/kg) of a vessel filled to liquid volume fraction `fraction` at saturation. */
export function fillVolume(fraction: number, rhoLiquid: number, rhoVapor: number): number {
	return 1 / (fraction * rhoLiquid + (1 - fraction) * rhoVapor);
}

/**
 * The start pair { T, v } for a fill spec (T in K, v in m³/kg). Throws the engine's ThermoError
 * when there is no saturation at the given T or P (below the triple point, above the critical
 * point), and a RangeError for a fraction outside 0…1 or not exactly one of T and P.
 */
export function fillStart(
	engine: SaturationSource,
	fluid: string,
	fill: FillSpec
): { T: number; v: number } & Inputs {
	if (!(fill.fraction >= 0 && fill.fraction <= 1))
		throw new RangeError('The liquid fill must be from 0 to 100 % of the volume.');
	if ((fill.T === undefined) === (fill.P === undefined))
		throw new RangeError('Give the fill at a temperature or at a pressure (one of them).');
	const sat =
		fill.T !== undefined
			? engine.saturationAtT(fluid, fill.T)
			: engine.saturationAtP(fluid, fill.P!);
	return { T: sat.T, v: fillVolume(fill.fraction, sat.liquid.rho, sat.vapor.rho) };
}

/** A fill level in words, in the sheet's units: "fill 80 % liquid by volume at 20.00 °C". */
export function fillText(fill: FillSpec, prefs: UnitPrefs): string {
	const pct = String(Number((fill.fraction * 100).toPrecision(4)));
	const at =
		fill.T !== undefined
			? formatQuantity(fill.T, 'temperature', prefs).full
			: formatQuantity(fill.P!, 'pressure', prefs).full;
	return `fill ${pct}\u00a0% liquid by volume at ${at}`;
}

/**
 * "20 °C", "293.15 K", "3 bar a", "250 kPa g" → { T } or { P } (SI, pressures absolute); a bare
 * number is refused (it could be either). A pressure without a or g is read as the sheet shows
 * pressures, and `assumed` says so.
 */
export function parseTemperatureOrPressure(
	text: string,
	prefs: UnitPrefs
): { ok: true; T?: number; P?: number; assumed?: string } | { ok: false; message: string } {
	const t = parseQuantity(text, 'temperature', { atmosphere: prefs.atmosphere });
	if (t.ok) return { ok: true, T: t.si };
	const p = parseQuantity(text, 'pressure', {
		atmosphere: prefs.atmosphere,
		bareReference: prefs.pressureReference
	});
	if (p.ok)
		return p.assumed === 'reference'
			? { ok: true, P: p.si, assumed: `read as ${prefs.pressureReference}` }
			: { ok: true, P: p.si };
	if (t.error.code === 'no-unit')
		return {
			ok: false,
			message: `Say whether ${text.trim()} is a temperature or a pressure, e.g. ${text.trim()} °C or ${text.trim()} bar a.`
		};
	return {
		ok: false,
		message:
			t.error.code === 'wrong-quantity' || t.error.code === 'unknown-unit'
				? `Give a temperature or a pressure with its unit, e.g. 20 °C or 3 bar a (${p.error.message})`
				: t.error.message
	};
}
