// The import fences of eslint.config.js (issue 16) refuse what they promise to refuse: a fence that
// silently stopped matching would let the core grow a server dependency without anyone noticing.
import { ESLint } from 'eslint';
import { describe, expect, it } from 'vitest';

const eslint = new ESLint({ cwd: process.cwd() });

/** The restricted-import messages ESLint gives a snippet placed at `filePath`. */
async function fenceMessages(code: string, filePath: string): Promise<string[]> {
	const [result] = await eslint.lintText(code, { filePath });
	if (!result) throw new Error(`ESLint gave no result for ${filePath}`);
	return result.messages.filter((m) => m.ruleId === 'no-restricted-imports').map((m) => m.message);
}

describe('import fences', () => {
	it('the core imports no SvelteKit, environment, database or server module', async () => {
		const messages = await fenceMessages(
			[
				"import { browser } from '$app/environment';",
				"import { env } from '$env/dynamic/private';",
				"import { sql } from 'drizzle-orm';",
				"import { db } from '$lib/server/db';",
				'export const all = [browser, env, sql, db];'
			].join('\n'),
			'src/lib/calc/fence-probe.ts'
		);
		expect(messages).toHaveLength(4);
	}, 60_000);

	it('code outside the core enters it only through $lib/calc; test support is the exception', async () => {
		const code = [
			"import { tieredAmount } from '$lib/calc/rates';",
			"import { calculate } from '$lib/calc';",
			"import { tiered } from '$lib/calc/tariffs.fixture';",
			'export const all = [tieredAmount, calculate, tiered];'
		].join('\n');
		for (const place of ['src/lib/server/fence-probe.ts', 'src/lib/text/fence-probe.ts']) {
			const messages = await fenceMessages(code, place);
			expect(messages, place).toHaveLength(1);
			expect(messages[0]).toContain('$lib/calc (its index)');
		}
	}, 60_000);

	it('only server code imports $lib/server', async () => {
		const code = "import { logger } from '$lib/server/log';\nexport const log = logger;";
		expect(await fenceMessages(code, 'src/lib/text/fence-probe.ts')).toHaveLength(1);
		expect(await fenceMessages(code, 'src/routes/fence-probe/+page.server.ts')).toHaveLength(0);
		expect(await fenceMessages(code, 'src/lib/server/fence-probe.ts')).toHaveLength(0);
	}, 60_000);
});
