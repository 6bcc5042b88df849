import type { PathResult } from '$lib/thermo';
import type { SheetDoc } from '$lib/sheets/types';
import { legPointsOf, withoutLegPoints, type LegPointsRef } from '$lib/sheets/leg-points';
import { draftResult } from './compute/sheet-frame';
import type { DB } from './db/schema';
import type { TeamAccess } from './access';
import { jsonError } from './api';
import { readSheetDraft } from './sheets';

/*
 * The sheet page's first paint of a draft: the path computed once per draft content and kept,
 * so a sheet viewed again costs no engine work and no re-serialising of its points. The page
 * carries the path without its legs' points; the points are one JSON body per draft content,
 * served by GET /api/v1/teams/{team}/sheets/{sheet}/draft/points/{key} (immutable: `key` is
 * taken from the stored draft's text, so the URL changes whenever the draft does).
 */

export interface FirstPaint {
	/** the path with its legs' points left out (they are at `points.url`), or null */
	result: PathResult | null;
	/** why the draft has no path (the engine's refusal), or null */
	resultError: string | null;
	/** where the legs' points are; null when the path has no legs or none was computed */
	points: LegPointsRef | null;
}

interface Entry {
	teamId: string;
	sheetId: string;
	key: string;
	/** the page's part */
	result: PathResult | null;
	resultError: string | null;
	legs: number;
	/** the points' answer: JSON text as bytes, with its strong ETag */
	body: Uint8Array<ArrayBuffer>;
	etag: string;
}

const entries = new Map<string, Entry>();
/** Drafts kept (most recently viewed last). */
export const FIRST_PAINTS_KEPT = 500;

const utf8 = new TextEncoder();
const id = (sheetId: string, key: string) => `${sheetId}:${key}`;

function build(teamId: string, sheetId: string, key: string, doc: SheetDoc): Entry {
	const { result, resultError } = draftResult(doc);
	const legs = result?.legs.length ?? 0;
	return {
		teamId,
		sheetId,
		key,
		result: result && legs ? withoutLegPoints(result) : result,
		resultError,
		legs,
		body: utf8.encode(JSON.stringify(result ? legPointsOf(result) : { points: [] })),
		etag: `"${key}"`
	};
}

function keep(e: Entry): Entry {
	const k = id(e.sheetId, e.key);
	entries.delete(k);
	entries.set(k, e);
	if (entries.size > FIRST_PAINTS_KEPT) entries.delete(entries.keys().next().value as string);
	return e;
}

/** The kept first paint of a draft (by sheet and the key of its stored text), computed if not kept. */
function entryFor(teamId: string, sheetId: string, key: string, doc: SheetDoc): Entry {
	const e = entries.get(id(sheetId, key));
	return keep(e && e.teamId === teamId ? e : build(teamId, sheetId, key, doc));
}

/**
 * The first paint of a sheet's draft for its page. `draftKey` is the key of the stored draft's
 * text (readSheetDraft); the same text gives the same answer, so it is computed once.
 */
export function firstPaint(
	team: { id: string; slug: string },
	sheetId: string,
	draftKey: string,
	doc: SheetDoc
): FirstPaint {
	const e = entryFor(team.id, sheetId, draftKey, doc);
	return {
		result: e.result,
		resultError: e.resultError,
		points: e.legs
			? {
					url: `/api/v1/teams/${team.slug}/sheets/${sheetId}/draft/points/${draftKey}`,
					legs: e.legs
				}
			: null
	};
}

/**
 * The answer to GET …/sheets/{sheet}/draft/points/{key} for a caller whose access to the team is
 * checked already: the kept points when this process has them (only for a sheet of the caller's
 * team), else the current draft's when its key is `key` (another process gave the page, a
 * restart), else 404 `draft-changed`. Immutable and private, strong ETag, 304 on If-None-Match.
 */
export async function legPointsAnswer(
	db: DB,
	access: TeamAccess,
	sheetId: string,
	key: string,
	ifNoneMatch: string | null
): Promise<Response> {
	let found = entries.get(id(sheetId, key));
	if (found && found.teamId === access.team.id) keep(found);
	else {
		const current = await readSheetDraft(db, access, sheetId);
		if (current.draftKey !== key)
			return jsonError(
				404,
				'draft-changed',
				'The draft of this sheet has changed since this URL was given: compute the current draft’s path with POST /api/v1/paths, or reload the sheet page.'
			);
		found = entryFor(access.team.id, sheetId, key, current.sheet.doc);
	}
	const headers = {
		etag: found.etag,
		'cache-control': 'private, max-age=31536000, immutable',
		vary: 'cookie, authorization'
	};
	const etag = found.etag;
	if (ifNoneMatch && ifNoneMatch.split(',').some((t) => [etag, `W/${etag}`].includes(t.trim())))
		return new Response(null, { status: 304, headers });
	return new Response(found.body, { headers: { ...headers, 'content-type': 'application/json' } });
}

/** Forget every kept first paint (tests). */
export function forgetFirstPaints(): void {
	entries.clear();
}
