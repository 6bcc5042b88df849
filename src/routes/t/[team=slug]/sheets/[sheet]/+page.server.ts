import { error } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/db';
import { requireTeam } from '$lib/server/guard';
import { isAppError } from '$lib/server/errors';
import { parseForm, readFormData, runAction } from '$lib/server/forms';
import { readSheet, renameTeamSheet, sheetDeletion, titleSchema } from '$lib/server/sheets';
import { sheetReviewData } from '$lib/server/review-pages';
import {
	computePath,
	fixState,
	getFluid,
	listFluids,
	saturationCurve,
	stateExtras,
	ThermoError,
	type PathResult,
	type SaturationCurve
} from '$lib/thermo';
import { engineSpec, labelIds, startOnlyResult } from '$lib/sheets/doc';
import { startOptions } from '$lib/sheets/choice';
import type { SheetDoc } from '$lib/sheets/types';

const domes = new Map<string, SaturationCurve>();
/** The vapor dome for the chart (cached per fluid); null if the engine cannot trace it — the sheet still opens. */
function dome(fluid: string): SaturationCurve | null {
	let d = domes.get(fluid);
	if (!d) {
		try {
			d = saturationCurve(fluid, 100);
		} catch (e) {
			if (!(e instanceof ThermoError)) throw e;
			console.error(`[statewright] the vapor dome of ${fluid} could not be traced: ${e.message}`);
			return null;
		}
		domes.set(fluid, d);
	}
	return d;
}

/** The draft computed for the first paint (the browser recomputes on every edit). */
function compute(doc: SheetDoc): { result: PathResult | null; resultError: string | null } {
	try {
		if (doc.spec.legs.length === 0) {
			const start = fixState(doc.spec.fluid, doc.spec.start, startOptions(doc.spec));
			return { result: startOnlyResult(doc, start, stateExtras(start)), resultError: null };
		}
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

export const load: PageServerLoad = async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	let sheet;
	try {
		sheet = await readSheet(getDb(), access, event.params.sheet);
	} catch (e) {
		if (isAppError(e)) error(e.status, { code: e.code, message: e.message });
		throw e;
	}
	const { doc, ...meta } = sheet;
	return {
		sheet: meta,
		doc,
		...compute(doc),
		fluid: getFluid(doc.spec.fluid),
		saturation: dome(doc.spec.fluid),
		fluids: listFluids(),
		canEdit: access.can('sheet:edit'),
		review: await sheetReviewData(getDb(), access, event.params.sheet),
		deletion: await sheetDeletion(getDb(), access, event.params.sheet)
	};
};

const renameForm = z.object({ title: titleSchema });

export const actions: Actions = {
	rename: async (event) => {
		const access = await requireTeam(event, event.params.team, 'sheet:edit');
		const parsed = parseForm(renameForm, await readFormData(event.request), ['title']);
		if (!parsed.ok) return parsed.failure;
		return runAction(parsed.values, async () => {
			const s = await renameTeamSheet(getDb(), access, event.params.sheet, parsed.data.title);
			return { title: s.title };
		});
	}
};
