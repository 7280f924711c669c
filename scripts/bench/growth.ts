/**
 * Growth curves for `npm run bench`: one series times the same work at growing sizes and prints a small
 * table of the size, the median and its ratio to the previous size's median, beside the size's own
 * ratio, so linear growth reads as the two ratios being about equal.
 */
import { fileURLToPath } from 'node:url';

export interface Step {
	/** How the size reads in the table, e.g. "1,000 devices". */
	label: string;
	/** The size as a number, for the size ratio (devices, months, scenarios or devices × scenarios). */
	size: number;
	run: () => unknown | Promise<unknown>;
	/** Timed runs (fewer for the big sizes, to keep the whole bench within a few minutes). */
	n: number;
	warmUp: number;
}

export function median(samples: number[]): number {
	const sorted = [...samples].sort((a, b) => a - b);
	const middle = Math.floor(sorted.length / 2);
	return sorted.length % 2 ? (sorted[middle] ?? 0) : ((sorted[middle - 1] ?? 0) + (sorted[middle] ?? 0)) / 2;
}

async function medianOf(step: Step): Promise<number> {
	for (let i = 0; i < step.warmUp; i++) await step.run();
	const samples: number[] = [];
	for (let i = 0; i < step.n; i++) {
		const start = performance.now();
		await step.run();
		samples.push(performance.now() - start);
	}
	return median(samples);
}

const ratio = (now: number, before: number | undefined) => (before ? `×${(now / before).toFixed(1)}` : '');

/** Times each step in turn and prints the series' table under its title. */
export async function growth(title: string, steps: Step[]): Promise<void> {
	console.log(`\n${title}`);
	console.log(
		`  ${'size'.padEnd(22)} ${'n'.padStart(3)} ${'median'.padStart(12)} ${'time ratio'.padStart(11)} ${'size ratio'.padStart(11)}`
	);
	let previous: { size: number; median: number } | undefined;
	for (const step of steps) {
		const ms = await medianOf(step);
		console.log(
			`  ${step.label.padEnd(22)} ${String(step.n).padStart(3)} ${`${ms.toFixed(2)} ms`.padStart(12)} ${ratio(ms, previous?.median).padStart(11)} ${ratio(step.size, previous?.size).padStart(11)}`
		);
		previous = { size: step.size, median: ms };
	}
}

/**
 * The workbook builder and the export input the route would build, loaded through tsx with SvelteKit's
 * `$lib` alias mapped to `src/lib` (`lib-paths.json`), so the bench needs no `svelte-kit sync` first.
 */
export async function workbookModules(): Promise<typeof import('./workbook')> {
	const { tsImport } = await import('tsx/esm/api');
	const tsconfig = fileURLToPath(new URL('./lib-paths.json', import.meta.url));
	return tsImport('./workbook.ts', { parentURL: import.meta.url, tsconfig });
}
