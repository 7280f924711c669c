import type { AirDesignInput, SiteWaterInput } from '$lib/calc';

/**
 * An invented small farm's water and air design, for the tests of the delivery rows and the "Water
 * and air" sheet: two fish tanks and a sump at 250 m, two air-lifts and diffusers fed by a typical
 * 60 L/min-class linear air pump (flow against pressure from AIR-AND-WATER.md's published sizing
 * table, as the designer's typical pumps are). Invented figures.
 */
export const FARM_WATER: SiteWaterInput = {
	altitudeM: 250,
	tanks: [
		{
			id: 'tank-a',
			name: 'Fish tank A',
			volumeLiters: 4000,
			depthM: 1.2,
			water: 'fresh',
			temperatureC: 26,
			monthlyTemperatureC: null,
			fishKg: 120,
			feedKgPerDay: 2.4,
			proteinPercent: 35
		},
		{
			id: 'tank-b',
			name: 'Fish tank B',
			volumeLiters: 4000,
			depthM: 1.2,
			water: 'fresh',
			temperatureC: 26,
			monthlyTemperatureC: null,
			fishKg: 100,
			feedKgPerDay: 2,
			proteinPercent: 35
		},
		{
			id: 'sump',
			name: 'Sump',
			volumeLiters: 1500,
			depthM: 0.8,
			water: 'fresh',
			temperatureC: 26,
			monthlyTemperatureC: null,
			fishKg: 0,
			feedKgPerDay: 0,
			proteinPercent: 35
		}
	]
};

export const FARM_DESIGN: AirDesignInput = {
	airlifts: [
		{
			name: 'Tank return air-lift',
			count: 2,
			riserInnerDiameter: 50,
			riserInnerDiameterUnit: 'mm',
			submergence: 0.9,
			submergenceUnit: 'm',
			lift: 0.25,
			liftUnit: 'm',
			waterFlow: 40,
			waterFlowUnit: 'lpm',
			efficiencyPercent: 30
		}
	],
	aeration: {
		tankId: 'tank-a',
		targetDoMgL: 5,
		diffuser: 'fine',
		diffuserDepth: 1.1,
		diffuserDepthUnit: 'm',
		alpha: 0.9,
		beta: 0.98,
		fouling: 0.9,
		theta: 1.024,
		depthCorrection: 0.4
	},
	lineLossKPa: 2,
	pump: {
		name: 'Linear air pump, 60 L/min class (typical values)',
		points: [
			{ pressureKPa: 0, airLpm: 75 },
			{ pressureKPa: 9.7, airLpm: 68 },
			{ pressureKPa: 13.8, airLpm: 62 },
			{ pressureKPa: 20.7, airLpm: 51 }
		],
		inputWatts: null,
		wireToAirPercent: 25
	}
};
