import { formatQuantity, type UnitPrefs } from '$lib/units';
import type {
	ChartCoords,
	ChartKind,
	ClampResult,
	FluidRange,
	SaturationCurve,
	TriplePoint
} from './types';
import { VIEWS } from './views';

export interface ClampBounds {
	triple?: TriplePoint | null;
	range?: FluidRange | null;
	/** supplies the vapor's specific volume at the triple point (first point of `vapor`) */
	saturation?: SaturationCurve | null;
}

/**
 * Keep a pointer position inside what the fluid's formulation can answer, and say why when it
 * moved it. Rules, by diagram:
 * - T–v: T below the triple point (or the formulation's Tmin) is raised to it — the solid is not
 *   modelled; T above Tmax is lowered to it.
 * - P–v: P above Pmax is lowered to it; P at or below zero (linear axis) is raised to the triple-point pressure. Below the triple-point pressure only vapor exists, at a
 *   temperature at least the triple point's, so its v is at least v_g,t · P_t / P (ideal gas along
 *   the triple-point isotherm; vapor there is very dilute); smaller v is moved out to that line.
 *   The liquid side is left to the engine: compressed liquid can be denser than the saturated
 *   liquid at the triple point (water near 4 °C), so no cheap bound is safe there.
 * The same temperature and pressure rules hold on every view with T or P on an axis (T–s, P–h);
 * the vapor-side rule needs v, so it is P–v's alone. h–s has neither.
 * Reasons name the limit in the sheet's units.
 */
export function clampCoords(
	kind: ChartKind,
	coords: ChartCoords,
	bounds: ClampBounds,
	prefs: UnitPrefs
): ClampResult {
	const out: ChartCoords = { ...coords };
	const reasons: string[] = [];
	const T = (k: number) => formatQuantity(k, 'temperature', prefs).full;
	const P = (pa: number) => formatQuantity(pa, 'pressure', prefs, { sig: 4 }).full;
	const range = bounds.range;
	const triple = bounds.triple;
	const pair = VIEWS[kind].pair;

	if (pair.includes('T') && out.T !== undefined) {
		const floor = Math.max(triple?.T ?? -Infinity, range?.Tmin ?? -Infinity);
		if (out.T < floor) {
			out.T = floor;
			reasons.push(
				triple && floor === triple.T
					? `Below the triple point (${T(floor)}): the solid is not modelled, so the state stays at the triple-point temperature.`
					: `Below the formulation's lowest temperature (${T(floor)}).`
			);
		}
		if (range && out.T > range.Tmax) {
			out.T = range.Tmax;
			reasons.push(`Above the formulation's highest temperature (${T(range.Tmax)}).`);
		}
	}

	if (pair.includes('P') && out.P !== undefined) {
		if (!(out.P > 0)) {
			out.P = triple?.P ?? 1;
			reasons.push('At or below a perfect vacuum: the pressure is held just above it.');
		}
		if (range && out.P > range.Pmax) {
			out.P = range.Pmax;
			reasons.push(`Above the formulation's highest pressure (${P(range.Pmax)}).`);
		}
		const vgTriple = bounds.saturation?.vapor[0]?.v;
		if (triple && vgTriple && out.v !== undefined && out.P < triple.P) {
			const vMin = (vgTriple * triple.P) / out.P;
			if (out.v < vMin) {
				out.v = vMin;
				reasons.push(
					`Below the triple-point pressure (${P(triple.P)}) only vapor exists: the state is kept on the vapor side.`
				);
			}
		}
	}

	return { coords: out, reason: reasons.length ? reasons.join(' ') : null };
}
