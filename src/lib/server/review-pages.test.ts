import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { expectAppError } from './testing';
import { reviewWorld, type ReviewWorld } from './revisions.test-support';
import { comparePageData, printPageData, revisionPageData, revisionParam } from './review-pages';
import { saveRevision } from './revisions';
import { createNote } from './notes';

let w: ReviewWorld;
beforeEach(async () => {
	w = await reviewWorld();
});
afterEach(async () => {
	await w.env.close();
});

describe('read-only page data', () => {
	it('gives a revision page its notes against that revision, sign-off and history', async () => {
		const sheet = await w.newSheet();
		await saveRevision(w.env.db, await w.access(w.people.designer), sheet, {
			message: 'First',
			baseRevision: null
		});
		await createNote(w.env.db, await w.access(w.people.checker), sheet, {
			anchor: { kind: 'leg', legId: 'vent' },
			body: 'Why 200 kPa?',
			revision: 1
		});
		const d = await revisionPageData(w.env.db, await w.access(w.people.checker), sheet, 1);
		expect(d.revision.number).toBe(1);
		expect(d.notes.map((n) => n.label)).toEqual(['L2']);
		expect(d.signOff.designer.name).toBe('Arlo Brandt');
		expect(d).toMatchObject({
			canCheck: true,
			canEdit: false,
			canWrite: true,
			latest: { number: 1, status: 'draft' }
		});
		expect(d.members.map((m) => m.name)).toContain('Priya Nandakumar');
		await expectAppError(
			revisionPageData(w.env.db, await w.access(w.people.checker), sheet, 2),
			404,
			'revision-not-found'
		);
	});

	it('compares two sides and prints a revision or the draft', async () => {
		const sheet = await w.newSheet();
		await saveRevision(w.env.db, await w.access(w.people.designer), sheet, {
			message: 'First',
			baseRevision: null
		});
		const c = await comparePageData(w.env.db, await w.access(w.people.viewer), sheet, 1, 'draft');
		expect(c.before.label).toBe('Rev 1');
		expect(c.after.label).toBe('Working draft');
		expect(c.revisions.map((r) => r.number)).toEqual([1]);
		const p = await printPageData(w.env.db, await w.access(w.people.viewer), sheet, 1);
		expect(p.revision?.number).toBe(1);
		expect(p.result?.legs).toHaveLength(2);
		expect('doc' in (p.revision as object)).toBe(false);
		const dr = await printPageData(w.env.db, await w.access(w.people.viewer), sheet, 'draft');
		expect(dr.revision).toBeNull();
		expect(dr.signOff.checker.name).toBeNull();
	});

	it('reads the rev parameter', () => {
		expect(revisionParam(null, 3)).toBe(3);
		expect(revisionParam(null, null)).toBe('draft');
		expect(revisionParam('draft', 3)).toBe('draft');
		expect(revisionParam('2', 3)).toBe(2);
		expect(() => revisionParam('x', 3)).toThrow(/rev must be/);
	});
});

describe('the sheet page’s review data', () => {
	it('brings revisions, notes against the draft, traces, members and the newest revision’s document', async () => {
		const { sheetReviewData } = await import('./review-pages');
		const { uploadTrace } = await import('./traces');
		const { readSheetDraft } = await import('./sheets');
		const sheet = await w.newSheet();
		const reviewOf = async (access: Awaited<ReturnType<typeof w.access>>) =>
			sheetReviewData(w.env.db, access, (await readSheetDraft(w.env.db, access, sheet)).row);
		const { review: empty, deletion: viewerDeletion } = await reviewOf(
			await w.access(w.people.viewer)
		);
		expect(viewerDeletion.allowed).toBe(false);
		expect(empty).toMatchObject({
			revisions: [],
			notes: [],
			traces: [],
			latestDoc: null,
			canEdit: false,
			canWrite: false
		});
		await saveRevision(w.env.db, await w.access(w.people.designer), sheet, {
			message: 'First',
			baseRevision: null
		});
		await uploadTrace(w.env.db, await w.access(w.people.designer), sheet, {
			bytes: new TextEncoder().encode('time [s],P [kPa a],T [°C]\n0,200,20\n'),
			filename: 'a.csv'
		});
		const { review: d } = await reviewOf(await w.access(w.people.designer));
		expect(d.revisions.map((r) => r.number)).toEqual([1]);
		expect(d.latestDoc?.spec.legs.map((l) => l.id)).toEqual(['heat', 'vent']);
		expect(d.traces[0].points).toHaveLength(1);
		expect(d).toMatchObject({
			canEdit: true,
			canWrite: true,
			canCheck: false,
			me: w.people.designer.id
		});
	});
});
