/**
 * The browser's calls for revisions, review notes and measured traces (the JSON API under
 * /api/v1/teams/{team}/sheets/{sheet}/…). Errors come back as ApiError (status, code, message and
 * the error body, e.g. `latest` and `yours` of a revision conflict, `rejected` lines of a refused
 * trace); a network failure as OfflineError.
 */
import { ApiError, OfflineError, apiCall } from '$lib/editor/client';
import type { SheetDoc, Anchor } from '$lib/sheets/types';
import type { PathResult } from '$lib/thermo/types';
import type { RevisionDiff } from '$lib/revisions/diff';
import type { SignOffAction } from '$lib/revisions/steps';
import type { NoteView, RevisionEvent, RevisionFull, RevisionSummary, TraceSummary } from './types';

export { ApiError, OfflineError };
export type {
	NoteView,
	ReplyView,
	RevisionEvent,
	RevisionFull,
	RevisionSummary,
	Signature,
	TraceSummary
} from './types';

export interface CompareSide {
	label: string;
	doc: SheetDoc;
	result: PathResult | null;
}

type Fetch = typeof fetch;

/** Calls for one sheet. */
export function reviewApi(team: string, sheet: string, f: Fetch = fetch) {
	const base = `/api/v1/teams/${encodeURIComponent(team)}/sheets/${encodeURIComponent(sheet)}`;
	const post = <T>(path: string, body: unknown) =>
		apiCall<T>(f, `${base}${path}`, { method: 'POST', body: JSON.stringify(body) });
	return {
		revisions: () =>
			apiCall<{ revisions: RevisionSummary[]; events: RevisionEvent[] }>(f, `${base}/revisions`),
		revision: (n: number) =>
			apiCall<{ revision: RevisionFull }>(f, `${base}/revisions/${n}`).then((r) => r.revision),
		saveRevision: (input: {
			message: string;
			baseRevision: number | null;
			draftVersion?: number;
			doc?: SheetDoc;
		}) => post<{ revision: RevisionFull }>('/revisions', input).then((r) => r.revision),
		step: (
			n: number,
			action: SignOffAction,
			input: { note?: string; checkerId?: string | null; override?: string } = {}
		) =>
			post<{ revision: RevisionSummary }>(`/revisions/${n}/${action}`, input).then(
				(r) => r.revision
			),
		restore: (n: number, version: number) =>
			post<{ version: number; updatedAt: number; updatedBy: string; doc: SheetDoc }>(
				`/revisions/${n}/restore`,
				{ version }
			),
		compare: (a: number | 'draft', b: number | 'draft') =>
			apiCall<{ diff: RevisionDiff; before: CompareSide; after: CompareSide }>(
				f,
				`${base}/revisions/compare?a=${a}&b=${b}`
			),
		notes: (revision: number | null = null) =>
			apiCall<{ notes: NoteView[]; open: number; outdated: number }>(
				f,
				`${base}/notes${revision ? `?revision=${revision}` : ''}`
			),
		addNote: (anchor: Anchor, body: string, revision: number | null = null) =>
			post<{ note: NoteView }>('/notes', { anchor, body, revision }).then((r) => r.note),
		reply: (id: string, body: string) =>
			post<{ note: NoteView }>(`/notes/${id}/replies`, { body }).then((r) => r.note),
		resolve: (id: string, resolved: boolean) =>
			apiCall<{ note: NoteView }>(f, `${base}/notes/${id}`, {
				method: 'PATCH',
				body: JSON.stringify({ resolved })
			}).then((r) => r.note),
		traces: (points: 'none' | 'chart' | 'all' = 'chart') =>
			apiCall<{ traces: TraceSummary[] }>(f, `${base}/traces?points=${points}`).then(
				(r) => r.traces
			),
		uploadTrace: (form: FormData) =>
			apiCall<{ trace: TraceSummary }>(f, `${base}/traces`, { method: 'POST', body: form }).then(
				(r) => r.trace
			),
		deleteTrace: (id: string) => apiCall<void>(f, `${base}/traces/${id}`, { method: 'DELETE' })
	};
}

export type ReviewApi = ReturnType<typeof reviewApi>;
