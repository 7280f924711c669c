// The invented imports of kill-mid-import.test.ts, built the same way in the test and in the child process
// it kills (kill-mid-import.child.ts). Every utility, bill and device here is made up.
import type { DeviceSpec } from '$lib/server/db/schema';
import type { Actor } from '$lib/server/workspaces/audit';
import type { ScenarioRow } from '$lib/server/sites/scenario.service';
import type { SiteRow } from '$lib/server/sites/site.service';
import type { Interval } from '$lib/server/usage/interval';

export const TRIPPED = 'kill-mid-import: tripped';
export const DONE = 'kill-mid-import: done';

/** Where the child stops: the `read`-th read (from 1) of `key` on the `index`-th input object, or on the actor. */
export type Tripwire = { on: 'row' | 'actor'; index?: number; key: string; read: number; hold: boolean };
export type ChildJob =
	| { kind: 'usage'; site: SiteRow; actor: Actor; kwh: number; trip: Tripwire }
	| { kind: 'bills'; site: SiteRow; actor: Actor; trip: Tripwire }
	| { kind: 'tariffs'; workspaceId: string; utility: string; actor: Actor; trip: Tripwire }
	| { kind: 'equipment'; site: SiteRow; scenario: ScenarioRow; actor: Actor; trip: Tripwire };

/** 2026 in 15-minute readings from 00:00 CST on 1 January: 35,040 intervals, 36 insert batches of 1,000. */
export const YEAR_QUARTER_HOURS = 365 * 96;

export const quarterHours = (count: number, kwh: number): Interval[] =>
	Array.from({ length: count }, (_, i) => ({
		start: new Date(Date.UTC(2026, 0, 1, 6) + i * 900_000),
		seconds: 900,
		kwh
	}));

/** Ten years of monthly bills, 2015 to 2024: 120 rows of the bill sheet. */
export const BILL_ROWS = 120;

export function billSheetCsv(): string {
	const rows = Array.from({ length: BILL_ROWS }, (_, i) => {
		const year = 2015 + Math.floor(i / 12);
		const month = (i % 12) + 1;
		const last = new Date(Date.UTC(year, month, 0)).getUTCDate();
		const mm = String(month).padStart(2, '0');
		return `${year}-${mm}-01,${year}-${mm}-${last},${1000 + i},${(150 + i / 4).toFixed(2)},,Invented bill`;
	});
	return ['period_from,period_to,kwh,amount,peak_kw,notes', ...rows].join('\r\n') + '\r\n';
}

/** Sixty flat tariffs of one invented utility: 60 rows of the tariff sheet. */
export const TARIFF_ROWS = 60;

export function tariffSheetCsv(utility: string): string {
	const header =
		'utility,name,code,country,customer_class,currency,timezone,effective_from,source,checked_on,energy_per_kwh';
	const rows = Array.from(
		{ length: TARIFF_ROWS },
		(_, i) =>
			`${utility},Flat rate ${i + 1},INV-${i + 1},US,agricultural,USD,America/Chicago,2027-01-01,Invented for a test,2026-11-20,0.${100 + i}`
	);
	return [header, ...rows].join('\r\n') + '\r\n';
}

/** An equipment list of `count` invented pumps named `${prefix} 1`, `${prefix} 2`… */
export const pumps = (prefix: string, count: number): DeviceSpec[] =>
	Array.from({ length: count }, (_, i) => ({
		name: `${prefix} ${i + 1}`,
		category: 'water-pump',
		quantity: 1,
		power: { watts: 500 + i },
		schedule: { type: 'always' }
	}));
