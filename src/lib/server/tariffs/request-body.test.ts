import { describe, expect, it } from 'vitest';
import { calculateRequestSchema, compareRequestSchema, parseRequest } from '$lib/calc';
import { calculateBodySchema, compareBodySchema } from './request-body';

const TARIFF = { currency: 'USD', energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.2 }] };
const FIELDS = {
	period: { start: '2027-01', months: 12 },
	timezone: 'America/Chicago',
	holidays: null,
	equipment: [{ name: 'Demo pump', power: { watts: 1000 }, schedule: { type: 'always' } }]
};
const ID = '00000000-0000-4000-8000-000000000000';

describe('a calculation body with its tariff inline or named by id', () => {
	it('answers every inline body exactly as the core request schema does', () => {
		const bodies: unknown[] = [
			{},
			null,
			[],
			'text',
			{ ...FIELDS, tariff: TARIFF },
			{ ...FIELDS, tariff: { name: 'x' } },
			{ ...FIELDS, tariff: TARIFF, equipment: [{ name: '' }], period: { start: 'soon' } },
			{ ...FIELDS, tariff: TARIFF, tariffId: ID }
		];
		let checked = 0;
		for (const body of bodies) {
			const core = parseRequest(calculateRequestSchema, body);
			const either = parseRequest(calculateBodySchema, body);
			expect(either.success, JSON.stringify(body)).toBe(core.success);
			checked += core.success ? 1 : 0;
			if (!core.success && !either.success) expect(either.error).toEqual(core.error);
			if (core.success && either.success) expect(either.data).toEqual({ inline: core.data });
		}
		expect(checked).toBe(2);
	});

	it('takes a tariffId instead of the tariff, and the time zone and holidays as optional', () => {
		const { timezone: _t, holidays: _h, ...rest } = FIELDS;
		const parsed = parseRequest(calculateBodySchema, { ...rest, tariffId: ID, tariffVersion: 2 });
		expect(parsed.success && parsed.data).toMatchObject({ library: { tariffId: ID, tariffVersion: 2 } });
		expect(parsed.success && 'library' in parsed.data && parsed.data.library.holidays).toBeUndefined();
	});

	it('checks the rest of a body that names a tariff by id, at the same places', () => {
		const parsed = parseRequest(calculateBodySchema, {
			...FIELDS,
			tariffId: 7,
			tariffVersion: 0,
			equipment: 'x'
		});
		expect(parsed.success).toBe(false);
		expect(!parsed.success && parsed.error.issues.map((i) => i.path).sort()).toEqual([
			'equipment',
			'tariffId',
			'tariffVersion'
		]);
	});

	it('keeps the comparison rules for a comparison that names its tariff by id', () => {
		const body = {
			period: { start: '2027-01', months: 6 },
			timezone: 'America/Chicago',
			scenarios: [{ name: 'Now', equipment: [] }],
			baseline: 3,
			finance: { horizonYears: 10, discountPercent: 5, escalationPercent: 2 }
		};
		const inline = parseRequest(compareRequestSchema, { ...body, tariff: TARIFF });
		const byId = parseRequest(compareBodySchema, { ...body, tariffId: ID });
		expect(!byId.success && byId.error.issues).toEqual(!inline.success && inline.error.issues);
	});
});
