import type { SubmitFunction } from '@sveltejs/kit';

/**
 * The `use:enhance` submit for Runrate's forms: after a refusal the fields and the chosen file stay
 * as they were, so they can be fixed and sent again, and `onbusy` (for disabling the buttons while a
 * sheet is read) hears when the answer is in.
 */
export function keepFields(onbusy?: (busy: boolean) => void): SubmitFunction {
	return () => {
		onbusy?.(true);
		return async ({ update }) => {
			await update({ reset: false });
			onbusy?.(false);
		};
	};
}
