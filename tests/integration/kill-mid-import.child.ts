// The process kill-mid-import.test.ts kills: `node --import tsx kill-mid-import.child.ts '<job JSON>'`. It
// runs one import through the app's own services against DATABASE_URL. A tripwire on one of the import's
// input objects marks the kill point: when the service reads that property the child prints TRIPPED and,
// if the job says hold, stands still (the transaction open, the database waiting) until it is killed.
import { writeSync } from 'node:fs';
import { register } from 'node:module';
import type { Actor } from '$lib/server/workspaces/audit';
import {
	billSheetCsv,
	DONE,
	pumps,
	quarterHours,
	tariffSheetCsv,
	TRIPPED,
	YEAR_QUARTER_HOURS,
	type ChildJob,
	type Tripwire
} from './kill-mid-import.data';

// `$lib`, `$app/environment` and `$env/dynamic/private` are Vite's; plain Node needs them mapped.
const lib = new URL('../../src/lib/', import.meta.url).href;
const hooks = `
export async function resolve(specifier, context, next) {
	if (specifier === '$app/environment')
		return { url: 'data:text/javascript,export const building = false, dev = false, browser = false;', shortCircuit: true };
	if (specifier === '$env/dynamic/private')
		return { url: 'data:text/javascript,export const env = process.env;', shortCircuit: true };
	if (specifier.startsWith('$lib/')) return next(${JSON.stringify(lib)} + specifier.slice(5), context);
	return next(specifier, context);
}`;

const HOLD_MS = 20_000;

function tripwire(target: object, wire: Tripwire) {
	let value: unknown = Reflect.get(target, wire.key);
	let reads = 0;
	Object.defineProperty(target, wire.key, {
		enumerable: true,
		configurable: true,
		get() {
			reads += 1;
			if (reads === wire.read) {
				writeSync(1, `${TRIPPED}\n`);
				// Blocks the event loop, so not one more statement goes to the database before the kill.
				if (wire.hold) Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, HOLD_MS);
			}
			return value;
		},
		set(next) {
			value = next;
		}
	});
}

function armed<T extends object>(rows: T[], actor: Actor, wire: Tripwire): Actor {
	const target = wire.on === 'actor' ? actor : rows[wire.index ?? 0];
	if (!target) throw new RangeError(`No row ${wire.index} to trip on`);
	tripwire(target, wire);
	return actor;
}

async function run(job: ChildJob) {
	const actor = { ...job.actor };
	if (job.kind === 'usage') {
		const { importUsage } = await import('$lib/server/usage/usage.service');
		const intervals = quarterHours(YEAR_QUARTER_HOURS, job.kwh);
		await importUsage(job.site, intervals, armed(intervals, actor, job.trip));
	} else if (job.kind === 'bills') {
		const { parseBillSheet } = await import('$lib/server/bills/bill-sheet');
		const { createBills } = await import('$lib/server/bills/bill.service');
		const sheet = await parseBillSheet(new TextEncoder().encode(billSheetCsv()), 'csv', []);
		if ('error' in sheet) throw new Error(sheet.error);
		const bills = sheet.rows.map((r) => r.bill);
		await createBills(job.site, bills, armed(bills, actor, job.trip));
	} else if (job.kind === 'tariffs') {
		const { parseTariffSheet } = await import('$lib/server/tariffs/sheet-import');
		const { importTariffs } = await import('$lib/server/tariffs/tariff.service');
		const sheet = await parseTariffSheet(new TextEncoder().encode(tariffSheetCsv(job.utility)), 'csv');
		if (sheet.sheetErrors.length || sheet.errors.length) throw new Error(JSON.stringify(sheet));
		await importTariffs(sheet.rows, job.workspaceId, armed(sheet.rows, actor, job.trip));
	} else {
		const { saveDevices } = await import('$lib/server/sites/equipment.service');
		const specs = pumps('Replacement pump', 50);
		const by = armed(specs, actor, job.trip);
		await saveDevices(job.site, job.scenario, job.scenario.revision, specs, by);
	}
}

register(`data:text/javascript,${encodeURIComponent(hooks)}`);
await run(JSON.parse(process.argv[2] ?? '') as ChildJob);
// Finished before the kill came: say so, and wait for it, so every run of the test ends the same way.
writeSync(1, `${DONE}\n`);
setTimeout(() => process.exit(0), HOLD_MS);
