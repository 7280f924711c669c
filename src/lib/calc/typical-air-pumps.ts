import type { AirPump } from './air-design.schema';

const pump = (name: string, points: [number, number][], inputWatts: number): AirPump => ({
	name,
	points: points.map(([pressureKPa, airLpm]) => ({ pressureKPa, airLpm })),
	inputWatts,
	wireToAirPercent: 25
});

/**
 * Generic classes of air pump with typical flow-against-pressure points and watts, for a first design
 * before a pump is chosen; the designer labels them as typical values to check against a data sheet.
 * The 60 L/min class uses a published septic-aerator sizing table (68 L/min at 9.7 kPa, 62 at 13.8, 51
 * at 20.7; see AIR-AND-WATER.md); the 40 L/min class one data sheet (40 L/min at 40 W near 13 kPa); the
 * others are typical of their class (common practice).
 */
export const TYPICAL_AIR_PUMPS: readonly { id: string; pump: AirPump; note: string }[] = [
	{
		id: 'aquarium-5',
		pump: pump(
			'Aquarium air pump, about 5 L/min',
			[
				[0, 5],
				[5, 3.5],
				[10, 1.8],
				[14, 0.5]
			],
			4
		),
		note: 'Small tanks and shallow air stones only; its flow falls fast with depth.'
	},
	{
		id: 'linear-40',
		pump: pump(
			'Linear diaphragm pump, 40 L/min class',
			[
				[0, 48],
				[10, 43],
				[13, 40],
				[16, 35],
				[20, 27]
			],
			40
		),
		note: 'A common size for a few air-lifts or a grow bed.'
	},
	{
		id: 'linear-60',
		pump: pump(
			'Linear diaphragm pump, 60 L/min class',
			[
				[0, 76],
				[9.7, 68],
				[13.8, 62],
				[20.7, 51]
			],
			50
		),
		note: 'Septic and pond aerator size; keeps most of its flow to about 14 kPa.'
	},
	{
		id: 'linear-120',
		pump: pump(
			'Linear diaphragm pump, 120 L/min class',
			[
				[0, 140],
				[10, 130],
				[15, 120],
				[20, 105],
				[25, 85]
			],
			110
		),
		note: 'Several tanks or deeper diffusers.'
	},
	{
		id: 'regenerative-400',
		pump: pump(
			'Regenerative blower, about 0.4 kW',
			[
				[0, 1300],
				[5, 1100],
				[10, 850],
				[15, 550],
				[20, 250]
			],
			400
		),
		note: 'Ponds and larger systems; watts are the nameplate rating.'
	}
];
