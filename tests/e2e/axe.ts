import type { Browser, Page } from '@playwright/test';
import type { ImpactValue } from 'axe-core';
import { createRequire } from 'node:module';

/**
 * axe-core, injected into the page by path. `@axe-core/playwright` needs Node 22 and the project runs on
 * Node 20, so the engine's own browser bundle is added as a script tag and run through `page.evaluate`.
 */
const AXE_SCRIPT = createRequire(import.meta.url).resolve('axe-core/axe.min.js');

/**
 * The app's Content Security Policy allows only its own nonced scripts, so the page's context must be
 * opened with these options for the injected engine to run (the policy is tested in security-headers).
 */
export const AXE_CONTEXT = { bypassCSP: true } as const;

/** A page in a context of its own on a 390 × 844 phone, opened so that axe can run in it; close the context after. */
export async function phoneWithAxe(browser: Browser, baseURL: string | undefined) {
	const context = await browser.newContext({
		baseURL,
		viewport: { width: 390, height: 844 },
		...AXE_CONTEXT
	});
	return { context, page: await context.newPage() };
}

/** The impacts that fail the gate: a person cannot use the page, or only with real difficulty. */
export const BLOCKING: ImpactValue[] = ['serious', 'critical'];

/** One failing element, in the words a reader of the test output needs to find and fix it. */
export type Finding = { rule: string; impact: ImpactValue; target: string; summary: string };

/** Runs axe on the whole document as it stands and returns its serious and critical findings (open the page's context with `AXE_CONTEXT`). */
export async function blockingFindings(page: Page): Promise<Finding[]> {
	if (!(await page.evaluate(() => 'axe' in window))) await page.addScriptTag({ path: AXE_SCRIPT });
	return page.evaluate(async (blocking) => {
		const { axe } = window as unknown as { axe: typeof import('axe-core') };
		const { violations } = await axe.run(document, { resultTypes: ['violations'] });
		return violations
			.filter((v) => v.impact && blocking.includes(v.impact))
			.flatMap((v) =>
				v.nodes.map((n) => ({
					rule: v.id,
					impact: (n.impact ?? v.impact)!,
					target: n.target.map((t) => (typeof t === 'string' ? t : t.join(' >>> '))).join(' '),
					summary: (n.failureSummary ?? v.help).replace(/\s+/g, ' ').trim()
				}))
			);
	}, BLOCKING);
}

/** A readable list for the failure message: one line per element, grouped under the page it was on. */
export function describeFindings(found: { where: string; findings: Finding[] }[]): string {
	return found
		.filter((f) => f.findings.length > 0)
		.map(
			({ where, findings }) =>
				`${where}\n` +
				findings.map((f) => `  [${f.impact}] ${f.rule} at ${f.target}: ${f.summary}`).join('\n')
		)
		.join('\n');
}
