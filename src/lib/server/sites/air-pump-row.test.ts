import { describe, expect, it } from 'vitest';
import type { PumpSelection } from '$lib/calc';
import type { DeviceSpec } from '../db/schema';
import { airDesignWords, airPumpRow, withAirPumpRow } from './air-pump-row';

const selection: PumpSelection = {
	pumpName: 'Linear pump 60 L/min class',
	count: 2,
	flowEachLpm: 52.5,
	totalFlowLpm: 105,
	wattsEach: 45,
	wattsTotal: 90,
	gaugeKPa: 8.9,
	wattsFrom: 'data-sheet'
};
const device = (name: string, more: Partial<DeviceSpec> = {}) =>
	({ name, category: 'other', power: { watts: 10 }, schedule: { type: 'always' }, ...more }) as DeviceSpec;

describe("the air designer's row", () => {
	it('is the pumps, always on, out of the water, with their free air each', () => {
		expect(airPumpRow(selection, [])).toEqual({
			name: 'Linear pump 60 L/min class',
			category: 'air-pump',
			quantity: 2,
			power: { watts: 45 },
			schedule: { type: 'always' },
			inWater: false,
			airLpm: 52.5,
			fromAirDesign: true
		});
	});

	it('takes a name no other device of the list has', () => {
		const others = [device('linear pump 60 L/min class'), device('Linear pump 60 L/min class (air design)')];
		expect(airPumpRow(selection, others).name).toBe('Linear pump 60 L/min class (air design 2)');
		const long = { ...selection, pumpName: 'P'.repeat(120) };
		expect(airPumpRow(long, [device('P'.repeat(120))]).name).toHaveLength(120);
	});

	it('goes at the end the first time, and in place of the old row after that (no duplicates)', () => {
		const first = withAirPumpRow([device('Heater'), device('Light')], selection);
		expect(first.map((d) => d.name)).toEqual(['Heater', 'Light', 'Linear pump 60 L/min class']);
		const moved = [first[2]!, first[0]!, first[1]!];
		const again = withAirPumpRow(moved, { ...selection, pumpName: 'Bigger pump', count: 1 });
		expect(again.map((d) => d.name)).toEqual(['Bigger pump', 'Heater', 'Light']);
		expect(again.filter((d) => d.fromAirDesign)).toHaveLength(1);
	});

	it('keeps its own old name free: a second design of the same pump reuses it', () => {
		const first = withAirPumpRow([device('Heater')], selection);
		expect(withAirPumpRow(first, selection).map((d) => d.name)).toEqual([
			'Heater',
			'Linear pump 60 L/min class'
		]);
	});

	it("is recorded in the trail in the brief's words", () => {
		expect(airDesignWords(selection)).toBe('Air design saved: 2 × Linear pump 60 L/min class, 45 W each');
	});
});
