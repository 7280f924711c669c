import { describe, expect, it } from 'vitest';
import { newDevice, toRequest, zoneWords } from './quick-estimate';
import { requestIssues } from './quick-estimate-check';
import {
	carriesEstimate,
	defaultEntries,
	entriesFromQuery,
	entriesToQuery,
	type QuickEntries
} from './quick-estimate-url';

const NOW = new Date(2026, 11, 3);
const roundTrip = (entries: QuickEntries) =>
	entriesFromQuery(new URLSearchParams(entriesToQuery(entries)), NOW);

describe('the quick estimate in the address', () => {
	it('comes back as it was typed: two devices, both power forms, both run modes, a flat rate', () => {
		const entries: QuickEntries = {
			...defaultEntries(NOW),
			month: '2027-01',
			perKwh: 0.2175,
			perMonth: 12.5,
			devices: [
				{ ...newDevice(), name: 'Sump pump_2 ~ east & west', quantity: 2, amps: 1.6, volts: 230 },
				{
					...newDevice(),
					name: 'Grow light',
					powerMode: 'watts',
					watts: 200,
					runMode: 'hours',
					hoursPerDay: 12
				}
			]
		};
		const back = roundTrip(entries);
		expect(back.month).toBe('2027-01');
		expect(back.perKwh).toBe(0.2175);
		expect(back.perMonth).toBe(12.5);
		expect(back.devices[0]).toMatchObject({
			name: 'Sump pump_2 ~ east & west',
			quantity: 2,
			amps: 1.6,
			volts: 230
		});
		expect(back.devices[1]).toMatchObject({
			powerMode: 'watts',
			watts: 200,
			runMode: 'hours',
			hoursPerDay: 12
		});
		expect(entriesToQuery(back)).toBe(entriesToQuery(entries));
	});

	it('writes a readable address', () => {
		const query = entriesToQuery({ ...defaultEntries(NOW), month: '2027-01' });
		expect(query).toBe('month=2027-01&kwh=0.15&fixed=0&d=1_1Ax120V_always_Water+pump');
	});

	it('keeps a library tariff by its id', () => {
		const tariffId = '0d3e5c1a-6f2b-4c1e-9a57-5e1f00000001';
		const back = roundTrip({ ...defaultEntries(NOW), rateMode: 'library', tariffId });
		expect(back).toMatchObject({ rateMode: 'library', tariffId });
	});

	it('brings an emptied box back empty, so its message shows again instead of a made-up value', () => {
		const entries = { ...defaultEntries(NOW), perKwh: null };
		entries.devices = [{ ...newDevice(), amps: null }];
		const back = roundTrip(entries);
		expect(back.perKwh).toBeNull();
		expect(back.devices[0]!.amps).toBeNull();
		expect(back.devices[0]!.volts).toBe(120);
	});

	it('falls back to the defaults for what is missing or garbled, and keeps at most eight devices', () => {
		const query = new URLSearchParams('month=2027-13&tariff=not-an-id');
		for (let i = 0; i < 12; i++) query.append('d', `1_${i}W_always_Light ${i}`);
		const back = entriesFromQuery(query, NOW);
		expect(back.month).toBe('2027-01');
		expect(back.rateMode).toBe('flat');
		expect(back.devices).toHaveLength(8);
		expect(carriesEstimate(new URLSearchParams(''))).toBe(false);
		expect(carriesEstimate(query)).toBe(true);
	});
});

describe('checking the entries before asking for an estimate', () => {
	const flat = { kind: 'flat' as const, perKwh: 0.15, perMonth: 0 };

	it('finds nothing wrong with the defaults', () => {
		expect(requestIssues(toRequest([newDevice()], flat, '2027-01', 'UTC'))).toEqual([]);
	});

	it('ties 30 hours a day and an empty amps box to their fields, as the API would', () => {
		const device = { ...newDevice(), amps: null, runMode: 'hours' as const, hoursPerDay: 30 };
		const issues = requestIssues(toRequest([device], flat, '2027-01', 'UTC'));
		expect(issues).toContainEqual({
			path: 'equipment.0.schedule.hoursPerDay',
			message: 'Hours per day must be at most 24'
		});
		expect(issues.map((i) => i.path)).toContain('equipment.0.power.amps');
	});

	it('refuses an empty price per kWh', () => {
		const issues = requestIssues(toRequest([newDevice()], { ...flat, perKwh: null }, '2027-01', 'UTC'));
		expect(issues.map((i) => i.path)).toEqual(['tariff.energyCharges.0.perKwh']);
	});
});

describe('a time zone in words', () => {
	it('names the zone as people say it, with its IANA name', () => {
		expect(zoneWords('Europe/Berlin', new Date('2027-01-15T12:00:00Z'))).toBe(
			'Central European Time (Europe/Berlin)'
		);
		expect(zoneWords('UTC')).toBe('Coordinated Universal Time (UTC)');
		expect(zoneWords('America/Los_Angeles')).toBe('Pacific Time (America/Los Angeles)');
	});
});
