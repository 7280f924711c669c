import { describe, expect, it } from 'vitest';
import { equipmentSchema } from './equipment.schema';
import { runningKw, standbyKw, unitWatts } from './power';

const parse = (input: unknown) => equipmentSchema.parse(input);

describe('power per unit', () => {
	// IEEE/handbook power formulas: P = V·I·PF (single phase), P = √3·V_LL·I·PF (balanced three phase).
	it.each([
		['single phase, PF 1', { amps: 1, volts: 120 }, 120],
		['single phase, PF 0.8', { amps: 5, volts: 230, powerFactor: 0.8 }, 920],
		['three phase, PF 1', { amps: 10, volts: 400, phases: 3 }, Math.sqrt(3) * 4000],
		[
			'three phase, PF 0.85',
			{ amps: 7.5, volts: 480, powerFactor: 0.85, phases: 3 },
			Math.sqrt(3) * 480 * 7.5 * 0.85
		],
		['watts as given', { watts: 75 }, 75]
	])('computes %s', (_case, power, watts) => {
		const equipment = parse({ name: 'Demo', power, schedule: { type: 'always' } });
		expect(unitWatts(equipment.power)).toBeCloseTo(watts, 2);
	});

	it('multiplies running power by quantity and duty, and standby by quantity only', () => {
		const equipment = parse({
			name: 'Demo heater',
			quantity: 3,
			power: { watts: 500 },
			dutyPercent: 40,
			standbyWatts: 2,
			schedule: { type: 'always' }
		});
		expect(runningKw(equipment)).toBeCloseTo(0.6, 12);
		expect(standbyKw(equipment)).toBeCloseTo(0.006, 12);
	});
});
