import {
	computePath,
	if97Extras,
	if97Fix,
	if97Isolines,
	if97SaturationCurve,
	fixState,
	getFluid,
	isolines as engineIsolines,
	saturationCurve,
	stateExtras,
	ThermoError,
	type Isoline,
	type Formulation,
	type IsolineKind,
	type PathResult,
	type SaturationCurve
} from '$lib/thermo';
import type { ChartFrame } from '$lib/review/types';
import type { SheetDoc } from '$lib/sheets/types';
import { firstStateResult, engineSpec, labelIds } from '$lib/sheets/doc';
import { startOptions } from '$lib/sheets/choice';
import { frameLimits, frameLines } from '$lib/sheets/frame';

/*
 * What a page needs to draw a sheet's path, computed on the server with the engine: the vapor
 * dome (cached per fluid and formulation), the chart's frame (a water sheet by IAPWS-IF97 gets IF97's
 * dome and background lines) and the draft's path for the first paint. The
 * editor asks the compute API for the same lines, chosen by the same `frameLines`.
 */

const domes = new Map<string, SaturationCurve>();

/**
 * The vapor dome for the chart, cached per fluid and formulation: water's by IAPWS-IF97 for an IF97
 * sheet (if97SaturationCurve), else the fluid's own equation's. Null if the engine cannot trace it —
 * the page still opens.
 */
export function dome(fluid: string, formulation: Formulation = 'iapws95'): SaturationCurve | null {
	const key = `${fluid}:${formulation}`;
	let d = domes.get(key);
	if (!d) {
		try {
			d = formulation === 'if97' ? if97SaturationCurve(100) : saturationCurve(fluid, 100);
		} catch (e) {
			if (!(e instanceof ThermoError)) throw e;
			console.error(`[statewright] the vapor dome of ${fluid} could not be traced: ${e.message}`);
			return null;
		}
		domes.set(key, d);
	}
	return d;
}

function lines(
	fluid: string,
	kind: IsolineKind,
	values: number[],
	formulation: Formulation
): Isoline[] {
	if (!values.length) return [];
	try {
		return formulation === 'if97'
			? if97Isolines(kind, values.slice(0, 40), 80)
			: engineIsolines(fluid, kind, values.slice(0, 40), 80);
	} catch (e) {
		if (e instanceof ThermoError) return [];
		throw e;
	}
}

/** The chart's frame for a document and (those that computed of) its paths. */
export function chartFrame(doc: SheetDoc, results: Array<PathResult | null>): ChartFrame {
	const f = getFluid(doc.spec.fluid);
	const states = results.flatMap((r) => r?.states ?? []).map((s) => s.state);
	const formulation = f.id === 'water' ? (doc.spec.formulation ?? 'iapws95') : 'iapws95';
	const saturation = dome(f.id, formulation);
	const want = frameLines(f, doc, states, saturation);
	return {
		fluid: f,
		saturation,
		isolines: Object.fromEntries(
			want.lines.map(([kind, values]) => [kind, lines(f.id, kind, values, formulation)])
		),
		limits: frameLimits(doc.spec.limits, {
			isobars: lines(f.id, 'isobar', want.limitIsobars, formulation),
			isotherms: lines(f.id, 'isotherm', want.limitIsotherms, formulation)
		})
	};
}

/** The draft's path for the first paint (the browser recomputes on every edit), or why it has none. */
export function draftResult(doc: SheetDoc): {
	result: PathResult | null;
	resultError: string | null;
} {
	try {
		if (doc.spec.legs.length === 0)
			return {
				result: firstStateResult(
					doc,
					{ fixState, stateExtras, if97Fix, if97Extras },
					startOptions(doc.spec)
				),
				resultError: null
			};
		return { result: computePath(engineSpec(doc)), resultError: null };
	} catch (e) {
		if (e instanceof ThermoError)
			return {
				result: null,
				resultError: labelIds(`${e.message}${e.hint ? ` ${e.hint}` : ''}`, doc.spec.legs)
			};
		throw e;
	}
}
