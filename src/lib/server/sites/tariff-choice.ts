// The tariff choice of a site or scenario, as a request issue.
import type { RequestIssue } from '$lib/calc';
import { tariffChoiceProblem, type TariffChooser } from '../tariffs/usable';

/**
 * A tariff chosen for a site or scenario, checked by the one rule (`tariffChoiceProblem`): the public
 * library or the site's own workspace, a guest only public ones and those already chosen, and a pinned
 * version that exists. Unknown and foreign ids get the same answer.
 */
export async function tariffChoiceIssue(
	chooser: TariffChooser,
	choice: { tariffId: string | null; tariffVersion: number | null },
	prefix = ''
): Promise<RequestIssue | null> {
	const problem = await tariffChoiceProblem(chooser, choice);
	return problem && { path: `${prefix}${problem.field}`, message: problem.message };
}
