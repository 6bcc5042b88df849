import { error } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { requireTeam } from '$lib/server/guard';
import { isAppError } from '$lib/server/errors';
import { parseForm, readFormData, runAction } from '$lib/server/forms';
import { readSheet, renameTeamSheet, sheetDeletion, titleSchema } from '$lib/server/sheets';
import { sheetReviewData } from '$lib/server/review-pages';
import { chartDataRef } from '$lib/server/chart-data';
import { draftResult } from '$lib/server/compute/sheet-frame';
import { getFluid } from '$lib/thermo';
import type { SheetDoc } from '$lib/sheets/types';

type Computed = ReturnType<typeof draftResult>;

/**
 * Drafts computed for the first paint, by sheet and draft version (a version's document never
 * changes), most recently used last: a sheet viewed again costs no engine work.
 */
const computed = new Map<string, Computed>();
const COMPUTED_MAX = 500;

function computeOnce(key: string, doc: SheetDoc): Computed {
	let c = computed.get(key);
	if (c) computed.delete(key);
	else c = draftResult(doc);
	computed.set(key, c);
	if (computed.size > COMPUTED_MAX) computed.delete(computed.keys().next().value as string);
	return c;
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
		...computeOnce(`${meta.id}@${meta.version}`, doc),
		fluid: getFluid(doc.spec.fluid),
		// the dome and the fluid list: one immutable resource per fluid, fetched by the browser
		chartData: chartDataRef(doc.spec.fluid),
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
