import type { SubmitFunction } from '@sveltejs/kit';

/**
 * For `use:enhance`: keep what was typed after the server answers (a failure echoes it anyway;
 * a success on an edit form should show the saved values), and report while the request runs.
 */
export function keepValues(onBusy?: (busy: boolean) => void): SubmitFunction {
	return () => {
		onBusy?.(true);
		return async ({ update }) => {
			await update({ reset: false });
			onBusy?.(false);
		};
	};
}
