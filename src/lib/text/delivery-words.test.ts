import { describe, expect, it } from 'vitest';
import type { Delivery } from '$lib/calc';
import { deliveryCells, LITERS_PER_US_GALLON, waterText } from './delivery-figures';
import { deliverySentence } from './delivery-words';

/** An invented scenario's delivery: oxygen supplied and demanded (g/h, null = not known) and mains units in water. */
function delivered(
	name: string,
	oxygen: [supplied: number | null, demand: number | null],
	mainsInWater: number,
	targetDoMgL: number | null = 5
) {
	const delivery: Delivery = {
		waterLpm: 200,
		turnoversPerHour: 2,
		oxygenSuppliedGramsPerHour: oxygen[0],
		oxygenDemandGramsPerHour: oxygen[1],
		targetDoMgL,
		mainsDevicesInWater: mainsInWater,
		ifLargestFails: { waterLpm: 0, waterUnit: 'Pump', oxygenSuppliedGramsPerHour: null, oxygenUnit: null }
	};
	return { name, delivery };
}

describe('the plain-words line on what scenarios deliver', () => {
	it('says both keep the fish above the target and names the one with no mains power in the water', () => {
		expect(
			deliverySentence([
				delivered('Big pump in the tank', [80, 60], 1),
				delivered('Small pump with air-lifts', [150, 60], 0)
			])
		).toBe('Both keep the fish above 5 mg/L; “Small pump with air-lifts” has no mains power in the water.');
	});

	it('counts a design sized exactly to the demand as enough, whatever the last digit', () => {
		expect(
			deliverySentence([
				delivered('A', [14.065870833333333, 14.065870833333335], 1),
				delivered('B', [21, 14], 0)
			])
		).toMatch(/^Both keep the fish above 5 mg\/L/);
	});

	it('names the scenario that falls short of the demand, with both figures', () => {
		expect(deliverySentence([delivered('Pump A', [40, 60], 0), delivered('Pump B', [90, 60], 0)])).toBe(
			'“Pump B” keeps the fish above 5 mg/L; “Pump A” falls short: 40 g O₂/h supplied against 60 g O₂/h needed at 5 mg/L; neither has mains power in the water.'
		);
	});

	it('says when no scenario’s oxygen is known, and when all have mains power in the water', () => {
		expect(deliverySentence([delivered('A', [null, 60], 1), delivered('B', [50, null], 2)])).toBe(
			'Neither says yet how much oxygen it supplies against the stock’s demand; both have mains power in the water.'
		);
	});

	it('counts three scenarios as "all three" and lists the unknown ones', () => {
		expect(
			deliverySentence([
				delivered('A', [70, 60], 1),
				delivered('B', [70, 60], 0),
				delivered('C', [null, null], 0)
			])
		).toBe(
			'“A” and “B” keep the fish above 5 mg/L; for “C” the oxygen against the demand is not known; “B” and “C” have no mains power in the water.'
		);
		expect(
			deliverySentence([
				delivered('A', [70, 60], 1),
				delivered('B', [70, 60], 1),
				delivered('C', [61, 60], 3)
			])
		).toBe('All three keep the fish above 5 mg/L; all three have mains power in the water.');
	});

	it('says "their target" when the targets differ, and nothing for a single scenario', () => {
		expect(deliverySentence([delivered('A', [70, 60], 0, 6), delivered('B', [70, 60], 0, 5)])).toBe(
			'Both keep the fish above their target dissolved oxygen; neither has mains power in the water.'
		);
		expect(deliverySentence([delivered('A', [70, 60], 0)])).toBe('');
	});

	it('reads the figures, not the names: a scenario named "air-lift" with mains in water is said to have it', () => {
		const line = deliverySentence([
			delivered('Air-lift scenario', [70, 60], 1),
			delivered('Pump scenario', [70, 60], 0)
		]);
		expect(line).toContain('“Pump scenario” has no mains power in the water');
	});
});

describe('the delivery figures in words', () => {
	it('gives water in L/min and US gal/min (1 US gal = 3.785411784 L, NIST Handbook 44)', () => {
		expect(LITERS_PER_US_GALLON).toBe(3.785411784);
		expect(waterText(378.5411784)).toBe('379 L/min (100 US gal/min)');
		expect(waterText(20)).toBe('20 L/min (5.3 US gal/min)');
	});

	it('says "not known" with how to know it where a figure is null', () => {
		const { delivery } = delivered('A', [null, null], 0);
		const cells = deliveryCells({ ...delivery, waterLpm: null, turnoversPerHour: null });
		expect(cells.waterMoved).toMatch(/^Not known: give each water pump’s flow/);
		expect(cells.turnovers).toMatch(/^Not known/);
		expect(cells.oxygenSupplied).toMatch(/^Not known: design the air side/);
		expect(cells.oxygenDemand).toMatch(/^Not known/);
		expect(cells.mainsInWater).toBe('0 units');
		expect(cells.waterIfLargestFails).toBe('0 L/min (0 US gal/min) without one “Pump”');
	});
});
