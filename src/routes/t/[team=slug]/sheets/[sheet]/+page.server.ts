import { error } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { requireTeam } from '$lib/server/guard';
import { isAppError } from '$lib/server/errors';
import { parseForm, readFormData, runAction } from '$lib/server/forms';
import { readSheet, renameTeamSheet, sheetDeletion, titleSchema } from '$lib/server/sheets';
import { sheetReviewData } from '$lib/server/review-pages';
import { dome, draftResult } from '$lib/server/compute/sheet-frame';
import { getFluid, listFluids } from '$lib/thermo';

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
		...draftResult(doc),
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
