/**
 * The sheet page's first paint and its caches: the path without its legs' points in the page,
 * the points under an immutable per-draft URL, stored documents checked once per text, and what
 * happens to each on a draft save, a new revision and a change of membership.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { reviewWorld, type ReviewWorld } from './revisions.test-support';
import { firstPaint, forgetFirstPaints, legPointsAnswer } from './first-paint';
import { readSheetDraft, readStoredDoc, saveDraft } from './sheets';
import { sheetReviewData } from './review-pages';
import { saveRevision } from './revisions';
import { removeMember, setMemberRole } from './db/memberships';
import { createTeamFor } from './teams';
import { resolveTeamAccess } from './guard';
import { vesselDoc } from '$lib/revisions/test-fixtures';
import { withLegPoints, type LegPoints } from '$lib/sheets/leg-points';
import type { TeamAccess } from './access';
import { expectAppError } from './testing';

let w: ReviewWorld;
beforeEach(async () => {
	forgetFirstPaints();
	w = await reviewWorld();
});
afterEach(async () => {
	await w.env.close();
});

async function pageOf(access: TeamAccess, sheet: string) {
	const read = await readSheetDraft(w.env.db, access, sheet);
	return { read, paint: firstPaint(access.team, sheet, read.draftKey, read.sheet.doc) };
}

async function points(access: TeamAccess, sheet: string, url: string, inm: string | null = null) {
	const key = url.split('/').at(-1) as string;
	return legPointsAnswer(w.env.db, access, sheet, key, inm);
}

describe('the first paint of a sheet page', () => {
	it('carries the path without its legs’ points, and names an immutable URL that has them', async () => {
		const sheet = await w.newSheet();
		const designer = await w.access(w.people.designer);
		const { read, paint } = await pageOf(designer, sheet);
		expect(paint.resultError).toBeNull();
		expect(paint.result!.legs.map((l) => l.leg.points.length)).toEqual([0, 0]);
		// the states and the legs' totals stay in the page (the table and readers without scripts)
		expect(paint.result!.states).toHaveLength(3);
		expect(paint.points).toEqual({
			url: `/api/v1/teams/${w.team.slug}/sheets/${sheet}/draft/points/${read.draftKey}`,
			legs: 2
		});

		const res = await points(designer, sheet, paint.points!.url);
		expect(res.status).toBe(200);
		expect(res.headers.get('cache-control')).toBe('private, max-age=31536000, immutable');
		expect(res.headers.get('etag')).toBe(`"${read.draftKey}"`);
		const got = (await res.json()) as LegPoints;
		const full = withLegPoints(paint.result!, got)!;
		expect(full.legs.every((l) => l.leg.points.length >= 2)).toBe(true);
		// the first point of the first leg is the start: water at 353.15 K, x = 0.02; python3-iapws
		// 1.5.2 (Debian), IAPWS95(T=353.15, x=0.02): P = 47414.474030124366 Pa, v = 0.06911163171265335 m³/kg
		const s1 = full.legs[0].leg.points[0];
		expect(s1.T).toBeCloseTo(353.15, 9);
		expect(Math.abs(s1.P / 47414.474030124366 - 1)).toBeLessThan(1e-7);
		expect(Math.abs(s1.v / 0.06911163171265335 - 1)).toBeLessThan(1e-7);

		const again = await points(designer, sheet, paint.points!.url, `"${read.draftKey}"`);
		expect(again.status).toBe(304);
	});

	it('gives a new URL after a draft save; the old one, not kept, is a 404 naming what to do', async () => {
		const sheet = await w.newSheet();
		const designer = await w.access(w.people.designer);
		const before = await pageOf(designer, sheet);
		const doc = vesselDoc([{ id: 'heat', process: 'isochoric', target: { T: 473.15 } }]);
		await saveDraft(w.env.db, designer, sheet, { version: before.read.sheet.version, doc });
		const after = await pageOf(designer, sheet);
		expect(after.read.draftKey).not.toBe(before.read.draftKey);
		expect(after.paint.points!.url).not.toBe(before.paint.points!.url);
		expect(after.paint.points!.legs).toBe(1);
		expect(after.paint.result!.states.at(-1)!.state.T).toBeCloseTo(473.15, 9);

		forgetFirstPaints(); // as another app process would see it
		const old = await points(designer, sheet, before.paint.points!.url);
		expect(old.status).toBe(404);
		const body = (await old.json()) as { error: { code: string; message: string } };
		expect(body.error.code).toBe('draft-changed');
		expect(body.error.message).toContain('POST /api/v1/paths');
		// the current URL is computed again from the stored draft
		const now = (await (
			await points(designer, sheet, after.paint.points!.url)
		).json()) as LegPoints;
		expect(now.points).toHaveLength(1);
	});

	it('keeps the draft’s key through a new revision, and the review data shows the revision', async () => {
		const sheet = await w.newSheet();
		const designer = await w.access(w.people.designer);
		const before = await pageOf(designer, sheet);
		const firstReview = await sheetReviewData(w.env.db, designer, before.read.row);
		expect(firstReview.review.latestDoc).toBeNull();
		await saveRevision(w.env.db, designer, sheet, { message: 'First', baseRevision: null });
		const after = await pageOf(designer, sheet);
		expect(after.paint.points!.url).toBe(before.paint.points!.url);
		const review = await sheetReviewData(w.env.db, designer, after.read.row);
		expect(review.review.revisions.map((r) => r.number)).toEqual([1]);
		expect(review.review.latestDoc!.spec.legs.map((l) => l.id)).toEqual(['heat', 'vent']);
		// a designer may not delete a sheet with a revision (the page's delete button says why)
		expect(firstReview.deletion.allowed).toBe(true);
		expect(review.deletion.allowed).toBe(false);
	});

	it('checks access on every request: not for a removed member, nor for another team', async () => {
		const sheet = await w.newSheet();
		const viewer = await w.access(w.people.viewer);
		const { paint } = await pageOf(viewer, sheet);
		expect((await points(viewer, sheet, paint.points!.url)).status).toBe(200);
		const principal = { kind: 'user' as const, user: w.people.viewer };

		await setMemberRole(w.env.db, w.team.id, w.people.viewer.id, 'checker');
		const checker = await resolveTeamAccess(w.env.db, principal, w.team.slug);
		expect(checker!.role).toBe('checker');
		expect((await points(checker!, sheet, paint.points!.url)).status).toBe(200);

		await removeMember(w.env.db, w.team.id, w.people.viewer.id);
		expect(await resolveTeamAccess(w.env.db, principal, w.team.slug)).toBeNull();

		// a member of another team asking for this sheet's kept points under their own team: not found
		const other = await createTeamFor(w.env.db, w.people.outsider, { name: 'Other Works' });
		const outsider = await resolveTeamAccess(
			w.env.db,
			{ kind: 'user', user: w.people.outsider },
			other.slug
		);
		await expectAppError(points(outsider!, sheet, paint.points!.url), 404, 'sheet-not-found');
	});

	it('says why a draft has no path, and names no points then', async () => {
		const sheet = await w.newSheet(vesselDoc([]));
		const { paint } = await pageOf(await w.access(w.people.designer), sheet);
		expect(paint.points).toBeNull();
		expect(paint.result!.states).toHaveLength(1);
	});
});

describe('stored documents', () => {
	it('are checked once per text, each reader getting a copy of its own', () => {
		const text = JSON.stringify(vesselDoc());
		const fail = (): never => {
			throw new Error('unreadable');
		};
		const a = readStoredDoc(text, fail);
		a.doc.spec.legs.pop();
		const b = readStoredDoc(text, fail);
		expect(b.doc.spec.legs).toHaveLength(2);
		expect(b.key).toBe(a.key);
		expect(b.key).toMatch(/^[\w-]{16}$/);
		const c = readStoredDoc(JSON.stringify(vesselDoc([])), fail);
		expect(c.key).not.toBe(a.key);
		expect(() => readStoredDoc('{not json', fail)).toThrow('unreadable');
	});
});
