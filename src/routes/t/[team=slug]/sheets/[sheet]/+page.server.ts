import { error } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { requireTeam } from '$lib/server/guard';
import { isAppError } from '$lib/server/errors';
import { parseForm, readFormData, runAction } from '$lib/server/forms';
import { readSheetDraft, renameTeamSheet, titleSchema } from '$lib/server/sheets';
import { sheetReviewData } from '$lib/server/review-pages';
import { chartDataRef } from '$lib/server/chart-data';
import { firstPaint } from '$lib/server/first-paint';
import { getFluid } from '$lib/thermo';

export const load: PageServerLoad = async (event) => {
	const access = await requireTeam(event, event.params.team, 'read');
	let read;
	try {
		read = await readSheetDraft(getDb(), access, event.params.sheet);
	} catch (e) {
		if (isAppError(e)) error(e.status, { code: e.code, message: e.message });
		throw e;
	}
	const { doc, ...meta } = read.sheet;
	const { review, deletion } = await sheetReviewData(getDb(), access, read.row);
	return {
		sheet: meta,
		doc,
		// the path computed once per draft content; its legs' points are a URL of their own
		...firstPaint(access.team, meta.id, read.draftKey, doc),
		fluid: getFluid(doc.spec.fluid),
		// the dome and the fluid list: one immutable resource per fluid, fetched by the browser
		chartData: chartDataRef(doc.spec.fluid),
		canEdit: access.can('sheet:edit'),
		review,
		deletion
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
