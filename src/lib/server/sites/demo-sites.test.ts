import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { siteSchema } from '$lib/forms/site.schema';
import { deviceSpecSchema } from './device-specs';

const demo = JSON.parse(readFileSync('data/demo-sites.json', 'utf8'));
const tariffIds = new Set(
	JSON.parse(readFileSync('data/demo-tariffs.json', 'utf8')).tariffs.map((t: { id: string }) => t.id)
);

describe('the invented demo sites', () => {
	it('are marked as invented and each has exactly one baseline', () => {
		expect(demo.note).toMatch(/invented/i);
		for (const site of demo.sites) {
			expect(site.name).toMatch(/\(demo\)/);
			expect(site.scenarios.filter((s: { isBaseline: boolean }) => s.isBaseline)).toHaveLength(1);
		}
	});

	it('use tariffs of the demo library and valid site fields', () => {
		for (const { scenarios: _s, id: _id, ...site } of demo.sites) {
			expect(tariffIds.has(site.tariffId)).toBe(true);
			expect(
				siteSchema.safeParse({
					...site,
					supplyVolts: String(site.supplyVolts),
					supplyPhases: String(site.supplyPhases)
				}).success
			).toBe(true);
		}
	});

	it('hold devices the equipment schema accepts', () => {
		for (const site of demo.sites)
			for (const scenario of site.scenarios)
				for (const device of scenario.devices)
					expect(deviceSpecSchema.safeParse(device).error?.issues ?? []).toEqual([]);
	});
});
