import type { DB } from './db/schema';
import { AppError } from './errors';
import type { TeamAccess } from './guard';
import {
	computePath,
	getFluid,
	isolines as engineIsolines,
	saturationCurve,
	ThermoError
} from '$lib/thermo';
import type { Isoline, IsolineKind, PathResult, SaturationCurve } from '$lib/thermo/types';
import type { ChartFrame } from '$lib/review/types';
import type { SheetDoc } from '$lib/sheets/types';
import { lineSpans, lineValues } from '$lib/sheets/isolines';
import { shownLines } from '$lib/sheets/chart-views';
import type { DesignLimits as ChartLimits, CurvePoint } from '$lib/charts/types';
import { listMembers } from './db/memberships';
import { latestRevision } from './db/revisions';
import {
	compareRevisions,
	listRevisions,
	loadSheet,
	readRevision,
	signOffOf,
	type CompareSide,
	type RevisionSummary
} from './revisions';
import { listNotes } from './notes';
import { listTraces } from './traces';
import { checkDoc } from './sheets';
import { getSheet } from './db/sheets';
import { engineSpec } from '$lib/sheets/doc';
import { signOffOverrides } from '$lib/export/title';

/*
 * Data the read-only pages (a revision, a comparison, the print view) need to draw a path without
 * the editor: the dome, background isolines and design-limit curves, computed here with the engine
 * the way the sketcher's editor asks the compute API for them.
 */

export type { ChartFrame } from '$lib/review/types';

const domes = new Map<string, SaturationCurve>();

function dome(fluid: string): SaturationCurve {
	let d = domes.get(fluid);
	if (!d) {
		d = saturationCurve(fluid, 100);
		domes.set(fluid, d);
	}
	return d;
}

function lines(fluid: string, kind: IsolineKind, values: number[]): Isoline[] {
	if (!values.length) return [];
	try {
		return engineIsolines(fluid, kind, values.slice(0, 40), 80);
	} catch (e) {
		if (e instanceof ThermoError) return [];
		throw e;
	}
}

/** The chart's frame for a document and (if it computed) its path. */
export function chartFrame(doc: SheetDoc, results: Array<PathResult | null>): ChartFrame {
	const f = getFluid(doc.spec.fluid);
	const states = results.flatMap((r) => r?.states ?? []).map((s) => s.state);
	const saturation = dome(f.id);
	const spans = lineSpans(f, saturation, states);
	const inRange = (kind: IsolineKind, v: number) =>
		kind === 'isobar'
			? v <= f.limits.Pmax
			: kind === 'isotherm'
				? v >= f.limits.Tmin && v <= f.limits.Tmax
				: true;
	const isolines: ChartFrame['isolines'] = {};
	for (const kind of shownLines(doc.chart))
		isolines[kind] = lines(
			f.id,
			kind,
			lineValues(kind, spans, doc.units).filter((v) => inRange(kind, v))
		);
	const lim = doc.spec.limits ?? {};
	const pLimits = [lim.designPressure, lim.reliefSetPressure].filter(
		(v): v is number => typeof v === 'number' && v <= f.limits.Pmax
	);
	const tLimits = [lim.designTemperature, lim.minimumTemperature].filter(
		(v): v is number => typeof v === 'number' && v >= f.triple.T && v <= f.limits.Tmax
	);
	const limitIsobars = lines(f.id, 'isobar', pLimits);
	const limitIsotherms = lines(f.id, 'isotherm', tLimits);
	const curve = (list: Isoline[], value: number | undefined): CurvePoint[] | undefined =>
		list.find((l) => Math.abs(l.value / (value ?? NaN) - 1) < 1e-9)?.points;
	const limits: ChartLimits = {};
	if (lim.designPressure !== undefined)
		limits.designPressure = {
			value: lim.designPressure,
			points: curve(limitIsobars, lim.designPressure)
		};
	if (lim.reliefSetPressure !== undefined)
		limits.reliefSetPressure = {
			value: lim.reliefSetPressure,
			points: curve(limitIsobars, lim.reliefSetPressure)
		};
	if (lim.designTemperature !== undefined)
		limits.designTemperature = {
			value: lim.designTemperature,
			points: curve(limitIsotherms, lim.designTemperature)
		};
	if (lim.minimumTemperature !== undefined)
		limits.minimumTemperature = {
			value: lim.minimumTemperature,
			points: curve(limitIsotherms, lim.minimumTemperature)
		};
	return {
		fluid: f,
		saturation,
		isolines,
		limits
	};
}

/** The sheet, its team's members (for mentions and checkers) and the newest revision number. */
export async function sheetContext(db: DB, access: TeamAccess, sheetId: string) {
	const sheet = await loadSheet(db, access, sheetId);
	const members = await listMembers(db, access.team.id);
	const latest = await latestRevision(db, sheet.id);
	return {
		sheet: {
			id: sheet.id,
			number: sheet.number,
			title: sheet.title,
			status: sheet.status,
			version: sheet.draft_version
		},
		members: members.map((m) => ({ id: m.user_id, name: m.name, role: m.role })),
		latest: latest ? { number: latest.number, status: latest.status } : null
	};
}

/** `?rev=N` or `?rev=draft` (default: the newest revision, else the draft). */
export function revisionParam(value: string | null, latest: number | null): number | 'draft' {
	if (value === null || value === '') return latest ?? 'draft';
	if (value === 'draft') return 'draft';
	if (/^[1-9]\d{0,8}$/.test(value)) return Number(value);
	throw new AppError(
		400,
		'invalid-revision',
		'rev must be a revision number (1, 2, …) or "draft".'
	);
}

// ---- page data -----------------------------------------------------------------------------------

function capabilities(access: TeamAccess) {
	return {
		canEdit: access.can('sheet:edit'),
		canCheck: access.can('sheet:check'),
		canApprove: access.can('sheet:approve'),
		canWrite: access.can('note:write')
	};
}

/** The read-only page of one revision: its path, notes shown against it, sign-off and history. */
export async function revisionPageData(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	number: number
) {
	const ctx = await sheetContext(db, access, sheetId);
	const revision = await readRevision(db, access, sheetId, number);
	const [{ notes }, traces, history] = await Promise.all([
		listNotes(db, access, sheetId, number),
		listTraces(db, access, sheetId, { points: 'chart' }),
		listRevisions(db, access, sheetId)
	]);
	return {
		...ctx,
		revision,
		frame: chartFrame(revision.doc, [revision.result]),
		notes,
		traces,
		revisions: history.revisions,
		events: history.events,
		signOff: signOffOf(revision),
		me: access.actor.id,
		...capabilities(access)
	};
}

/** The comparison page: both sides with their paths, the diff, and the revision list for the pickers. */
export async function comparePageData(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	a: CompareSide,
	b: CompareSide
) {
	const ctx = await sheetContext(db, access, sheetId);
	const c = await compareRevisions(db, access, sheetId, a, b);
	const history = await listRevisions(db, access, sheetId);
	return {
		...ctx,
		a,
		b,
		...c,
		frame: chartFrame(c.after.doc, [c.after.result, c.before.result]),
		revisions: history.revisions.map((r: RevisionSummary) => ({
			number: r.number,
			status: r.status,
			message: r.message
		}))
	};
}

/** The print view of a revision or of the working draft. */
export async function printPageData(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	rev: number | 'draft'
) {
	const ctx = await sheetContext(db, access, sheetId);
	let doc;
	let result: PathResult | null;
	let revision: RevisionSummary | null = null;
	if (rev === 'draft') {
		const row = (await getSheet(db, access.team.id, ctx.sheet.id))!;
		doc = checkDoc(JSON.parse(row.draft)).doc;
		try {
			result = computePath(engineSpec(doc));
		} catch (e) {
			if (!(e instanceof ThermoError)) throw e;
			result = null;
		}
	} else {
		const {
			doc: frozen,
			result: computed,
			...summary
		} = await readRevision(db, access, sheetId, rev);
		doc = frozen;
		result = computed;
		revision = summary;
	}
	const [{ notes }, traces, { events }] = await Promise.all([
		listNotes(db, access, sheetId, rev === 'draft' ? null : rev),
		listTraces(db, access, sheetId, { points: 'chart' }),
		listRevisions(db, access, sheetId)
	]);
	return {
		...ctx,
		rev,
		overrides: revision ? signOffOverrides(events, revision.number) : [],
		doc,
		result,
		revision,
		signOff: revision
			? signOffOf(revision)
			: {
					designer: { name: null, at: null },
					checker: { name: null, at: null },
					approver: { name: null, at: null }
				},
		frame: chartFrame(doc, [result]),
		notes,
		traces,
		teamName: access.team.name
	};
}

/**
 * What the sheet page adds for review: revisions and the sign-off log, review notes against the
 * working draft, measured traces (thinned for the chart), members (mentions, checkers), the newest
 * revision's document (to tell whether the draft changed since), and the viewer's capabilities.
 */
export async function sheetReviewData(db: DB, access: TeamAccess, sheetId: string) {
	const ctx = await sheetContext(db, access, sheetId);
	const [history, { notes }, traces] = await Promise.all([
		listRevisions(db, access, sheetId),
		listNotes(db, access, sheetId, null),
		listTraces(db, access, sheetId, { points: 'chart' })
	]);
	const latestDoc = ctx.latest
		? (await readRevision(db, access, sheetId, ctx.latest.number)).doc
		: null;
	return {
		revisions: history.revisions,
		events: history.events,
		notes,
		traces,
		members: ctx.members,
		latestDoc,
		me: access.actor.id,
		...capabilities(access)
	};
}
