// `npm run e2e:loaded [runs]`: the end-to-end suite run several times in a row while both cores are kept
// busy, as CI's busy machine may be. The script starts one CPU-burning child per core, runs
// `npm test -- e2e` the given number of times (3 unless told), stops the burners whatever happens, and
// prints each run's closing line and a last line "N passed, N failed" over all runs.
import { spawn } from 'node:child_process';
import { availableParallelism } from 'node:os';
import { root } from './lib.mjs';

const runs = Number(process.argv[2] ?? 3);
if (!Number.isInteger(runs) || runs < 1 || runs > 10) throw new Error('runs: a whole number from 1 to 10');

// Each burner spins for at most two hours, so one left behind by a killed parent still ends by itself.
const burners = Array.from({ length: availableParallelism() }, () =>
	spawn(process.execPath, ['-e', 'const end = Date.now() + 2 * 3600e3; while (Date.now() < end) {}'], {
		stdio: 'ignore'
	})
);
const stopBurners = () => burners.forEach((b) => b.kill('SIGKILL'));
process.on('exit', stopBurners);
process.on('SIGINT', () => process.exit(130));
process.on('SIGTERM', () => process.exit(143));

function e2eOnce() {
	return new Promise((resolve) => {
		const child = spawn('npm', ['test', '--', 'e2e'], { cwd: root, stdio: ['ignore', 'pipe', 'inherit'] });
		let last = '';
		child.stdout.on('data', (chunk) => {
			process.stdout.write(chunk);
			const line = String(chunk)
				.match(/(\d+) passed, (\d+) failed/g)
				?.at(-1);
			if (line) last = line;
		});
		child.on('exit', (code) => resolve({ code, last }));
	});
}

const results = [];
for (let i = 1; i <= runs; i++) {
	const started = performance.now();
	const { code, last } = await e2eOnce();
	const [passed, failed] = (last.match(/\d+/g) ?? ['0', '1']).map(Number);
	results.push({ passed, failed: failed || (code === 0 ? 0 : 1) });
	console.log(
		`[loaded] run ${i} of ${runs}: ${passed} passed, ${failed} failed in ${((performance.now() - started) / 1000).toFixed(0)} s, with ${burners.length} cores burned`
	);
}
stopBurners();
const sum = (key) => results.reduce((total, r) => total + r[key], 0);
console.log(`${sum('passed')} passed, ${sum('failed')} failed`);
process.exit(sum('failed') ? 1 : 0);
