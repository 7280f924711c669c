/**
 * Growth curves for `npm run bench`: one series times the same work at growing sizes and prints a small
 * table of the size, the median and its ratio to the previous size's median (of the wall-clock time and
 * of the process's CPU time), beside the size's own ratio, so linear growth reads as about equal ratios.
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

/** Medians of the wall-clock time and of this process's CPU time (less moved by other work on the machine). */
async function medians(step: Step): Promise<{ wall: number; cpu: number }> {
	for (let i = 0; i < step.warmUp; i++) await step.run();
	const wall: number[] = [];
	const cpu: number[] = [];
	for (let i = 0; i < step.n; i++) {
		const usage = process.cpuUsage();
		const start = performance.now();
		await step.run();
		wall.push(performance.now() - start);
		const used = process.cpuUsage(usage);
		cpu.push((used.user + used.system) / 1000);
	}
	return { wall: median(wall), cpu: median(cpu) };
}

const ratio = (now: number, before: number | undefined) => (before ? `×${(now / before).toFixed(1)}` : '');
const ms = (value: number) => `${value.toFixed(2)} ms`;
const row = (cells: string[]) =>
	`  ${cells.map((cell, i) => (i === 0 ? cell.padEnd(18) : cell.padStart(i === 1 ? 3 : 11))).join(' ')}`;

/** Times each step in turn and prints the series' table under its title. */
export async function growth(title: string, steps: Step[]): Promise<void> {
	console.log(`\n${title}`);
	console.log(row(['size', 'n', 'median', 'ratio', 'CPU median', 'CPU ratio', 'size ratio']));
	let previous: { size: number; wall: number; cpu: number } | undefined;
	for (const step of steps) {
		const { wall, cpu } = await medians(step);
		console.log(
			row([
				step.label,
				String(step.n),
				ms(wall),
				ratio(wall, previous?.wall),
				ms(cpu),
				ratio(cpu, previous?.cpu),
				ratio(step.size, previous?.size)
			])
		);
		previous = { size: step.size, wall, cpu };
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
