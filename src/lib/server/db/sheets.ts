import { sql, type Expression, type SqlBool } from 'kysely';
import type { DB, SheetRow, SheetStatusValue } from './schema';
import { jsonArrayLength, jsonText, likeOperator } from './dialect';

/** A sheet as lists show it: no draft body, with title-block fields and the leg count read from it. */
export interface SheetListItem {
	id: string;
	team_id: string;
	number: number;
	title: string;
	fluid: string;
	system_kind: 'closed' | 'flow';
	example: string | null;
	status: SheetStatusValue;
	draft_version: number;
	tag: string;
	equipment: string;
	project: string;
	leg_count: number;
	created_by_label: string;
	created_at: number;
	updated_by_label: string;
	updated_at: number;
}

export interface NewSheetRow {
	id: string;
	teamId: string;
	title: string;
	fluid: string;
	systemKind: 'closed' | 'flow';
	example: string | null;
	draft: string;
	actor: { id: string | null; label: string };
}

/** The next free number in the team (call inside the creating transaction). */
export async function nextSheetNumber(db: DB, teamId: string): Promise<number> {
	const r = await db
		.selectFrom('sheets')
		.select((eb) => eb.fn.max<number | null>('number').as('n'))
		.where('team_id', '=', teamId)
		.executeTakeFirst();
	return (r?.n ?? 0) + 1;
}

export async function insertSheet(db: DB, input: NewSheetRow, now = Date.now()): Promise<SheetRow> {
	const row: SheetRow = {
		id: input.id,
		team_id: input.teamId,
		number: await nextSheetNumber(db, input.teamId),
		title: input.title,
		fluid: input.fluid,
		system_kind: input.systemKind,
		status: 'draft',
		example: input.example,
		draft: input.draft,
		draft_version: 1,
		created_by: input.actor.id,
		created_by_label: input.actor.label,
		created_at: now,
		updated_by: input.actor.id,
		updated_by_label: input.actor.label,
		updated_at: now
	};
	await db.insertInto('sheets').values(row).execute();
	return row;
}

/** A sheet of a team by id (ids of other teams' sheets are not found). */
export async function getSheet(db: DB, teamId: string, id: string): Promise<SheetRow | undefined> {
	return db
		.selectFrom('sheets')
		.selectAll()
		.where('team_id', '=', teamId)
		.where('id', '=', id)
		.executeTakeFirst();
}

const LIST_COLUMNS = [
	'id',
	'team_id',
	'number',
	'title',
	'fluid',
	'system_kind',
	'example',
	'status',
	'draft_version',
	'created_by_label',
	'created_at',
	'updated_by_label',
	'updated_at'
] as const;

/** `%text%` with LIKE's wildcards escaped (matched with ESCAPE '\'). */
export function likePattern(text: string): string {
	return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

const SEARCHED = [
	['titleBlock', 'tag'],
	['titleBlock', 'equipment'],
	['titleBlock', 'project'],
	['titleBlock', 'documentNumber'],
	['titleBlock', 'site'],
	['description']
] as const;

function searchCondition(db: DB, q: string): Expression<SqlBool> | null {
	const words = q
		.trim()
		.split(/\s+/)
		.filter((w) => w.length > 0)
		.slice(0, 8);
	if (!words.length) return null;
	const likeOp = sql.raw(likeOperator(db));
	const parts = words.map((w) => {
		const p = likePattern(w);
		const num = /^#?\d{1,9}$/.test(w) ? Number(w.replace('#', '')) : null;
		const like = (field: Expression<unknown>) => sql<SqlBool>`${field} ${likeOp} ${p} escape '\\'`;
		const fields = [
			sql.ref('title'),
			sql.ref('fluid'),
			...SEARCHED.map((at) => jsonText(db, 'draft', at))
		];
		return sql<SqlBool>`(${sql.join(fields.map(like), sql` or `)}
			${num !== null ? sql`or number = ${num}` : sql``})`;
	});
	return sql<SqlBool>`(${sql.join(parts, sql` and `)})`;
}

export interface ListOptions {
	/** words that must all appear in the title, fluid, title block, description or number */
	q?: string;
	limit?: number;
	offset?: number;
}

/** A team's sheets, most recently changed first. */
export async function listSheets(
	db: DB,
	teamId: string,
	options: ListOptions = {}
): Promise<SheetListItem[]> {
	let query = db
		.selectFrom('sheets')
		.select(LIST_COLUMNS)
		.select([
			jsonText(db, 'draft', ['titleBlock', 'tag']).as('tag'),
			jsonText(db, 'draft', ['titleBlock', 'equipment']).as('equipment'),
			jsonText(db, 'draft', ['titleBlock', 'project']).as('project'),
			jsonArrayLength(db, 'draft', ['spec', 'legs']).as('leg_count')
		])
		.where('team_id', '=', teamId);
	const cond = options.q ? searchCondition(db, options.q) : null;
	if (cond) query = query.where(cond);
	return query
		.orderBy('updated_at', 'desc')
		.orderBy('number', 'desc')
		.limit(Math.min(200, Math.max(1, options.limit ?? 50)))
		.offset(Math.max(0, options.offset ?? 0))
		.execute() as Promise<SheetListItem[]>;
}

export async function countSheets(db: DB, teamId: string, q?: string): Promise<number> {
	let query = db
		.selectFrom('sheets')
		.select((eb) => eb.fn.countAll<number>().as('n'))
		.where('team_id', '=', teamId);
	const cond = q ? searchCondition(db, q) : null;
	if (cond) query = query.where(cond);
	const r = await query.executeTakeFirst();
	return Number(r?.n ?? 0);
}

/** Sheet counts per team (by the team's slug), for the teams a person belongs to. */
export async function sheetCountsForUser(db: DB, userId: string): Promise<Map<string, number>> {
	const rows = await db
		.selectFrom('sheets as s')
		.innerJoin('memberships as m', 'm.team_id', 's.team_id')
		.innerJoin('teams as t', 't.id', 's.team_id')
		.select(['t.slug', (eb) => eb.fn.countAll<number>().as('n')])
		.where('m.user_id', '=', userId)
		.groupBy('t.slug')
		.execute();
	return new Map(rows.map((r) => [r.slug, Number(r.n)]));
}

export interface RecentSheet extends SheetListItem {
	team_slug: string;
	team_name: string;
}

/** The most recently changed sheets across every team a person belongs to. */
export async function listRecentSheetsForUser(
	db: DB,
	userId: string,
	limit = 8
): Promise<RecentSheet[]> {
	return db
		.selectFrom('sheets as s')
		.innerJoin('memberships as m', 'm.team_id', 's.team_id')
		.innerJoin('teams as t', 't.id', 's.team_id')
		.select(LIST_COLUMNS.map((c) => `s.${c}` as const))
		.select([
			jsonText(db, 's.draft', ['titleBlock', 'tag']).as('tag'),
			jsonText(db, 's.draft', ['titleBlock', 'equipment']).as('equipment'),
			jsonText(db, 's.draft', ['titleBlock', 'project']).as('project'),
			jsonArrayLength(db, 's.draft', ['spec', 'legs']).as('leg_count'),
			't.slug as team_slug',
			't.name as team_name'
		])
		.where('m.user_id', '=', userId)
		.orderBy('s.updated_at', 'desc')
		.limit(Math.min(50, Math.max(1, limit)))
		.execute() as Promise<RecentSheet[]>;
}

export interface DraftWrite {
	draft: string;
	fluid: string;
	systemKind: 'closed' | 'flow';
	/** the version the editor started from; the write happens only if it is still current */
	baseVersion: number;
	actor: { id: string | null; label: string };
}

/** Write a draft if nobody saved since `baseVersion`: the new version, or null on a conflict. */
export async function writeDraft(
	db: DB,
	teamId: string,
	id: string,
	input: DraftWrite,
	now = Date.now()
): Promise<number | null> {
	const r = await db
		.updateTable('sheets')
		.set({
			draft: input.draft,
			fluid: input.fluid,
			system_kind: input.systemKind,
			draft_version: input.baseVersion + 1,
			updated_by: input.actor.id,
			updated_by_label: input.actor.label,
			updated_at: now
		})
		.where('team_id', '=', teamId)
		.where('id', '=', id)
		.where('draft_version', '=', input.baseVersion)
		.executeTakeFirst();
	return Number(r.numUpdatedRows) === 1 ? input.baseVersion + 1 : null;
}

export async function renameSheet(
	db: DB,
	teamId: string,
	id: string,
	title: string,
	actor: { id: string | null; label: string },
	now = Date.now()
): Promise<boolean> {
	const r = await db
		.updateTable('sheets')
		.set({ title, updated_by: actor.id, updated_by_label: actor.label, updated_at: now })
		.where('team_id', '=', teamId)
		.where('id', '=', id)
		.executeTakeFirst();
	return Number(r.numUpdatedRows) === 1;
}

/** Deletes a sheet; its revisions, events, notes and traces go with it (foreign keys cascade). */
export async function deleteSheetRow(db: DB, teamId: string, id: string): Promise<boolean> {
	const r = await db
		.deleteFrom('sheets')
		.where('team_id', '=', teamId)
		.where('id', '=', id)
		.executeTakeFirst();
	return Number(r.numDeletedRows) > 0;
}
