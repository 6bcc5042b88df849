import type { DB, SheetTraceRow } from './schema';

export type TraceListRow = Omit<SheetTraceRow, 'points'>;

const LIGHT = [
	'id',
	'sheet_id',
	'team_id',
	'name',
	'original_filename',
	'fluid',
	'columns',
	'atmosphere',
	'tolerance',
	'point_count',
	'in_dome_count',
	'rejected_count',
	'rejected',
	'notes',
	'started_at',
	'uploaded_by',
	'uploaded_by_label',
	'uploaded_at'
] as const;

export async function insertTrace(db: DB, row: SheetTraceRow): Promise<void> {
	await db.insertInto('sheet_traces').values(row).execute();
}

export async function listTraceRows(db: DB, sheetId: string): Promise<TraceListRow[]> {
	return db
		.selectFrom('sheet_traces')
		.select(LIGHT)
		.where('sheet_id', '=', sheetId)
		.orderBy('uploaded_at', 'asc')
		.orderBy('id', 'asc')
		.execute();
}

export async function listTraceRowsWithPoints(db: DB, sheetId: string): Promise<SheetTraceRow[]> {
	return db
		.selectFrom('sheet_traces')
		.selectAll()
		.where('sheet_id', '=', sheetId)
		.orderBy('uploaded_at', 'asc')
		.orderBy('id', 'asc')
		.execute();
}

export async function getTraceRow(
	db: DB,
	sheetId: string,
	id: string
): Promise<SheetTraceRow | undefined> {
	return db
		.selectFrom('sheet_traces')
		.selectAll()
		.where('sheet_id', '=', sheetId)
		.where('id', '=', id)
		.executeTakeFirst();
}

export async function deleteTraceRow(db: DB, sheetId: string, id: string): Promise<boolean> {
	const r = await db
		.deleteFrom('sheet_traces')
		.where('sheet_id', '=', sheetId)
		.where('id', '=', id)
		.executeTakeFirst();
	return Number(r.numDeletedRows) === 1;
}

export async function countTraces(db: DB, sheetId: string): Promise<number> {
	const r = await db
		.selectFrom('sheet_traces')
		.select((eb) => eb.fn.countAll<number>().as('n'))
		.where('sheet_id', '=', sheetId)
		.executeTakeFirst();
	return Number(r?.n ?? 0);
}
