/**
 * An error a user or client can act on: a status (4xx), a stable code, a message saying what to
 * do instead, and optionally the form field it concerns. Services throw it; form actions turn
 * it into `fail(status, …)` and API routes into `{ error: { code, message } }`.
 */
export class AppError extends Error {
	readonly status: number;
	readonly code: string;
	readonly field: string | undefined;
	/** for 429: when to try again */
	readonly retryAfterMs: number | undefined;

	constructor(
		status: number,
		code: string,
		message: string,
		field?: string,
		options: { retryAfterMs?: number } = {}
	) {
		super(message);
		this.name = 'AppError';
		this.status = status;
		this.code = code;
		this.field = field;
		this.retryAfterMs = options.retryAfterMs;
	}
}

export function isAppError(e: unknown): e is AppError {
	return e instanceof AppError;
}
