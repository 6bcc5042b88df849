/**
 * The browser's calls for revisions, review notes and measured traces (the JSON API under
 * /api/v1/teams/{team}/sheets/{sheet}/…). Errors come back as ApiError (status, code, message and
 * the error body, e.g. `latest` and `yours` of a revision conflict, `rejected` lines of a refused
 * trace); a network failure as OfflineError.
 */
import { ApiError, OfflineError } from '../sheets/client';
import type { SheetDoc, Anchor } from '../sheets/types';
import type { PathResult } from '../thermo/types';
import type { RevisionDiff } from '../revisions/diff';
import type { RejectedLine, TraceColumn, TracePoint } from '../traces/types';

export { ApiError, OfflineError };

export interface Signature {
	id: string | null;
	name: string;
	at: number;
}

export type SignOffStatus = 'draft' | 'in-check' | 'checked' | 'approved';

export interface RevisionSummary {
	number: number;
	basedOn: number | null;
	title: string;
	message: string;
	author: Signature;
	status: SignOffStatus;
	submitted: (Signature & { checkerId: string | null }) | null;
	checked: Signature | null;
	approved: Signature | null;
	returned: Signature | null;
	latest: boolean;
}

export interface RevisionFull extends RevisionSummary {
	doc: SheetDoc;
	result: PathResult;
}

export interface RevisionEvent {
	number: number;
	kind: string;
	actor: string;
	note: string | null;
	at: number;
}

export interface ReplyView {
	id: string;
	kind: 'reply' | 'resolved' | 'reopened';
	body: string;
	author: { id: string | null; name: string };
	at: number;
	mentions: string[];
}

export interface NoteView {
	id: string;
	anchor: Anchor;
	writtenAt: string;
	label: string | null;
	outdated: boolean;
	revision: number | null;
	body: string;
	author: { id: string | null; name: string };
	at: number;
	mentions: string[];
	resolved: { by: string; at: number } | null;
	replies: ReplyView[];
	lastActivityAt: number;
}

export interface TraceSummary {
	id: string;
	name: string;
	filename: string;
	fluid: string;
	columns: TraceColumn[];
	atmosphere: number;
	tolerance: number;
	pointCount: number;
	inDomeCount: number;
	rejectedCount: number;
	rejected: RejectedLine[];
	notes: string[];
	startedAt: string | null;
	uploadedBy: string;
	uploadedAt: number;
	stale: boolean;
	points?: TracePoint[];
}

export interface CompareSide {
	label: string;
	doc: SheetDoc;
	result: PathResult | null;
}

type Fetch = typeof fetch;

async function call<T>(f: Fetch, url: string, init: RequestInit = {}): Promise<T> {
	let res: Response;
	const json = typeof init.body === 'string';
	try {
		res = await f(url, { ...init, headers: { accept: 'application/json', ...(json ? { 'content-type': 'application/json' } : {}), ...(init.headers ?? {}) } });
	} catch (e) {
		if (e instanceof DOMException && e.name === 'AbortError') throw e;
		throw new OfflineError(e);
	}
	if (res.status === 204) return undefined as T;
	let body: unknown = null;
	try {
		body = await res.json();
	} catch {
		body = null;
	}
	if (!res.ok) {
		const err = (body as { error?: { code?: string; message?: string } } | null)?.error;
		throw new ApiError(res.status, err?.code ?? `http-${res.status}`, err?.message ?? `The server answered ${res.status}.`, (err ?? {}) as Record<string, unknown>);
	}
	return body as T;
}

/** Calls for one sheet. */
export function reviewApi(team: string, sheet: string, f: Fetch = fetch) {
	const base = `/api/v1/teams/${encodeURIComponent(team)}/sheets/${encodeURIComponent(sheet)}`;
	const post = <T>(path: string, body: unknown) => call<T>(f, `${base}${path}`, { method: 'POST', body: JSON.stringify(body) });
	return {
		revisions: () => call<{ revisions: RevisionSummary[]; events: RevisionEvent[] }>(f, `${base}/revisions`),
		revision: (n: number) => call<{ revision: RevisionFull }>(f, `${base}/revisions/${n}`).then((r) => r.revision),
		saveRevision: (input: { message: string; baseRevision: number | null; draftVersion?: number; doc?: SheetDoc }) =>
			post<{ revision: RevisionFull }>('/revisions', input).then((r) => r.revision),
		step: (n: number, action: 'submit' | 'withdraw' | 'check' | 'return' | 'approve', input: { note?: string; checkerId?: string | null } = {}) =>
			post<{ revision: RevisionSummary }>(`/revisions/${n}/${action}`, input).then((r) => r.revision),
		restore: (n: number, version: number) => post<{ version: number; updatedAt: number; updatedBy: string; doc: SheetDoc }>(`/revisions/${n}/restore`, { version }),
		compare: (a: number | 'draft', b: number | 'draft') => call<{ diff: RevisionDiff; before: CompareSide; after: CompareSide }>(f, `${base}/revisions/compare?a=${a}&b=${b}`),
		notes: (revision: number | null = null) => call<{ notes: NoteView[]; open: number; outdated: number }>(f, `${base}/notes${revision ? `?revision=${revision}` : ''}`),
		addNote: (anchor: Anchor, body: string, revision: number | null = null) => post<{ note: NoteView }>('/notes', { anchor, body, revision }).then((r) => r.note),
		reply: (id: string, body: string) => post<{ note: NoteView }>(`/notes/${id}/replies`, { body }).then((r) => r.note),
		resolve: (id: string, resolved: boolean) => call<{ note: NoteView }>(f, `${base}/notes/${id}`, { method: 'PATCH', body: JSON.stringify({ resolved }) }).then((r) => r.note),
		traces: (points: 'none' | 'chart' | 'all' = 'chart') => call<{ traces: TraceSummary[] }>(f, `${base}/traces?points=${points}`).then((r) => r.traces),
		uploadTrace: (form: FormData) => call<{ trace: TraceSummary }>(f, `${base}/traces`, { method: 'POST', body: form }).then((r) => r.trace),
		deleteTrace: (id: string) => call<void>(f, `${base}/traces/${id}`, { method: 'DELETE' })
	};
}

export type ReviewApi = ReturnType<typeof reviewApi>;
