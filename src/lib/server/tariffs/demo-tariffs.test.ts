import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import {
	calculate,
	calculateRequestSchema,
	holidaysSchema,
	type Tariff,
	tariffSchema,
	timezoneSchema
} from '$lib/calc';
import { type TariffMeta, tariffMetaSchema, versionMetaSchema } from '$lib/forms/tariff-meta.schema';

// The invented demo library that the seed script loads (data/demo-tariffs.json).
interface DemoVersion {
	id: string;
	number: number;
	effectiveFrom: string;
	changeNote: string;
	structure: unknown;
}
interface DemoTariff {
	id: string;
	versions: DemoVersion[];
	[field: string]: unknown;
}
const file = JSON.parse(readFileSync('data/demo-tariffs.json', 'utf8')) as {
	note: string;
	tariffs: DemoTariff[];
};
const library = file.tariffs.map((tariff) => ({
	raw: tariff,
	meta: tariffMetaSchema.parse(tariff),
	structures: tariff.versions.map((version) => tariffSchema.parse(version.structure))
}));
type Entry = (typeof library)[number];
const named = (tariff: DemoTariff) => `${String(tariff.utility)}: ${String(tariff.name)}`;
const isUuid = (id: string) => z.uuid().safeParse(id).success;

describe('the demo library file', () => {
	it('says that it is invented', () => {
		expect(file.note).toMatch(/invented/i);
		for (const { meta } of library) expect(meta.utility).toMatch(/\(invented\)$/);
	});

	it('holds at least eight tariffs from two or three utilities', () => {
		expect(library.length).toBeGreaterThanOrEqual(8);
		const utilities = new Set(library.map(({ meta }) => meta.utility));
		expect(utilities.size).toBeGreaterThanOrEqual(2);
		expect(utilities.size).toBeLessThanOrEqual(3);
	});

	it('uses unique, fixed UUIDs for tariffs and versions', () => {
		const ids = file.tariffs.flatMap((tariff) => [
			tariff.id,
			...tariff.versions.map((version) => version.id)
		]);
		expect(new Set(ids).size).toBe(ids.length);
		expect(ids.filter((id) => !isUuid(id))).toEqual([]);
	});
});

describe.each(file.tariffs.map((tariff) => [named(tariff), tariff] as const))('%s', (_, tariff) => {
	it('passes the tariff metadata, time-zone and holiday checks', () => {
		expect(tariffMetaSchema.safeParse(tariff).error?.issues).toBeUndefined();
		expect(timezoneSchema.safeParse(tariff.timezone).error?.issues).toBeUndefined();
		expect(holidaysSchema.safeParse(tariff.holidays).error?.issues).toBeUndefined();
	});

	it('numbers its versions 1..n with increasing effective dates', () => {
		expect(tariff.versions.map((version) => version.number)).toEqual(tariff.versions.map((_, i) => i + 1));
		const dates = tariff.versions.map((version) => version.effectiveFrom);
		expect(dates).toEqual([...dates].sort());
		expect(new Set(dates).size).toBe(dates.length);
	});

	it.each(tariff.versions.map((version) => [version.number, version] as const))(
		'version %i passes the version and charge checks, in the tariff’s currency',
		(_, version) => {
			expect(versionMetaSchema.safeParse(version).error?.issues).toBeUndefined();
			const structure = tariffSchema.safeParse(version.structure);
			expect(structure.error?.issues).toBeUndefined();
			expect(structure.data?.currency).toBe(tariff.currency);
		}
	);

	it.each(tariff.versions.map((version) => [version.number, version] as const))(
		'version %i prices 1 kW always on through 2027 at 30 to 600 a month',
		(_, version) => {
			const request = calculateRequestSchema.parse({
				period: { start: '2027-01', months: 12 },
				timezone: tariff.timezone,
				holidays: tariff.holidays,
				tariff: version.structure,
				equipment: [{ name: 'Reference load', power: { watts: 1000 }, schedule: { type: 'always' } }]
			});
			const result = calculate(request);
			expect(result.periods).toHaveLength(12);
			// 30 to 600 a month: a plausible range for 730 kWh, common practice, no source.
			const monthly = result.totals.cost / 12;
			expect(monthly).toBeGreaterThan(30);
			expect(monthly).toBeLessThan(600);
		}
	);
});

const charges = (structures: Tariff[]) => structures.flatMap((structure) => structure.energyCharges);
const has = (entry: Entry, test: (structure: Tariff, meta: TariffMeta) => boolean) =>
	entry.structures.some((structure) => test(structure, entry.meta));
const inclines = (rates: number[]) =>
	rates.length > 1 && rates.every((rate, i) => i === 0 || rate > rates[i - 1]!);

const summerOnly = (months: number[]) => months.includes(7) && !months.includes(1);
const usZones = new Set(library.filter(({ meta }) => meta.country === 'US').map(({ meta }) => meta.timezone));

const FEATURES: Array<[string, (entry: Entry) => boolean]> = [
	['a flat energy rate', (e) => charges(e.structures).some((c) => c.type === 'flat')],
	[
		'inclining tiers',
		(e) => charges(e.structures).some((c) => c.type === 'tiered' && inclines(c.tiers.map((t) => t.perKwh)))
	],
	[
		'seasonal time-of-use with holidays priced as weekends',
		(e) =>
			has(
				e,
				(s) => s.holidaysAsWeekends && s.energyCharges.some((c) => c.type === 'tou' && c.seasons.length > 1)
			)
	],
	[
		'a US country/region holiday rule',
		(e) => has(e, (_, m) => m.country === 'US' && !!m.holidays && 'region' in m.holidays)
	],
	['an explicit holiday date list', (e) => !!e.meta.holidays && 'dates' in e.meta.holidays],
	[
		'agricultural 15-minute demand with a summer on-peak window',
		(e) =>
			e.meta.customerClass === 'agricultural' &&
			has(e, (s) =>
				s.demandCharges.some(
					(d) => d.intervalMinutes === 15 && !!d.windows?.length && summerOnly(d.months ?? [])
				)
			)
	],
	['a per-day fixed charge', (e) => has(e, (s) => s.fixedCharges.some((f) => f.perDay !== undefined))],
	['a rider', (e) => has(e, (s) => s.riders.length > 0)],
	['a percentage tax', (e) => has(e, (s) => s.taxes.some((t) => t.percent > 0))],
	['a minimum bill', (e) => has(e, (s) => (s.minimumMonthly ?? 0) > 0)],
	[
		'another country with its own currency and time zone',
		(e) => e.meta.country !== 'US' && e.meta.currency !== 'USD' && !usZones.has(e.meta.timezone)
	]
];

describe('what the demo library covers', () => {
	it.each(FEATURES)('has %s', (_, feature) => {
		expect(library.filter(feature).map(({ meta }) => meta.name)).not.toEqual([]);
	});

	it('has at least two tariffs with a 2026 and a newer 2027 version that changed rates and says why', () => {
		const revised = library.filter(({ raw, structures }) => {
			const [older, newer] = raw.versions;
			return (
				raw.versions.length === 2 &&
				older?.effectiveFrom === '2026-01-01' &&
				newer?.effectiveFrom === '2027-01-01' &&
				newer.changeNote.length > 0 &&
				JSON.stringify(structures[0]) !== JSON.stringify(structures[1])
			);
		});
		expect(revised.length).toBeGreaterThanOrEqual(2);
	});
});
