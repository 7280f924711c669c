// A site's water as the site form holds it: every box as typed text, posted as plain form fields named
// by the tank's row ("tanks.0.volume", "tanks.0.monthlyTemperatureC.3"), so the form works as the other
// site fields do and comes back as typed after a refusal. `tank-read.ts` turns the post into the core's
// siteWaterSchema input.
import type { SiteWater, Tank } from '$lib/calc';
import { numberText } from '$lib/components/fields/number-text';

/** One tank or pond as typed. Numbers stay text; the units say what the volume and depth are in. */
export type TankDraft = {
	/** The row's number in the post ("tanks.3.…"), so a message goes back to the row it came from. */
	row?: number;
	id: string;
	name: string;
	volume: string;
	/** One of VOLUME_UNITS, as posted (a hand-made post may send anything; the reader says so). */
	volumeUnit: string;
	depth: string;
	/** One of TANK_DEPTH_UNITS, as posted. */
	depthUnit: string;
	water: string;
	salinityGPerKg: string;
	temperatureC: string;
	/** The "varies by month" switch: the twelve boxes count, the single one does not. */
	byMonth: boolean;
	/** Twelve boxes, January first; kept while the switch is off so switching back loses nothing. */
	monthlyTemperatureC: string[];
	fishKg: string;
	feedKgPerDay: string;
	proteinPercent: string;
};

/** The site's water as typed: the altitude in metres and the tanks in the form's order. */
export type WaterDraft = { altitudeM: string; tanks: TankDraft[] };

/** Most sites keep one or two tanks; the schema allows 50, and the form's rows are numbered 0–99. */
export const MAX_TANKS = 50;

/** A tank id the browser makes for a new row: a UUID without its dashes (32 characters, within 40). */
export const newTankId = (): string => crypto.randomUUID().replaceAll('-', '');

/** A new row: fresh water, feed at the usual 35 % protein (the schema's default), no fish yet. */
export function blankTank(id: string): TankDraft {
	return {
		id,
		name: '',
		volume: '',
		volumeUnit: 'L',
		depth: '',
		depthUnit: 'm',
		water: 'fresh',
		salinityGPerKg: '',
		temperatureC: '',
		byMonth: false,
		monthlyTemperatureC: Array<string>(12).fill(''),
		fishKg: '',
		feedKgPerDay: '',
		proteinPercent: '35'
	};
}

/** A stored tank as the form shows it: litres and metres, the stored figures unrounded. */
export function tankDraftOf(tank: Tank): TankDraft {
	const monthly = tank.monthlyTemperatureC;
	return {
		id: tank.id,
		name: tank.name,
		volume: numberText(tank.volumeLiters),
		volumeUnit: 'L',
		depth: numberText(tank.depthM),
		depthUnit: 'm',
		water: tank.water,
		salinityGPerKg: numberText(tank.salinityGPerKg),
		temperatureC: numberText(tank.temperatureC),
		byMonth: monthly !== null,
		monthlyTemperatureC: monthly ? monthly.map(numberText) : Array<string>(12).fill(''),
		fishKg: numberText(tank.fishKg),
		feedKgPerDay: numberText(tank.feedKgPerDay),
		proteinPercent: numberText(tank.proteinPercent)
	};
}

/** A stored site's water as the form shows it. */
export const waterDraftOf = (water: SiteWater): WaterDraft => ({
	altitudeM: numberText(water.altitudeM),
	tanks: water.tanks.map(tankDraftOf)
});

const ROW = /^tanks\.(\d{1,2})\.(\w+)(?:\.(\d{1,2}))?$/;
const TEXT_FIELDS = [
	'id',
	'name',
	'volume',
	'volumeUnit',
	'depth',
	'depthUnit',
	'water',
	'salinityGPerKg',
	'temperatureC',
	'fishKg',
	'feedKgPerDay',
	'proteinPercent'
] as const;

/** Whether a row holds nothing a person typed (a row added and left blank is dropped, not refused). */
export function isBlank(tank: TankDraft): boolean {
	const boxes = [tank.name, tank.volume, tank.depth, tank.temperatureC, tank.fishKg, tank.feedKgPerDay];
	return (
		boxes.every((text) => !text.trim()) && (!tank.byMonth || tank.monthlyTemperatureC.every((t) => !t.trim()))
	);
}

/**
 * The water a form posted, as typed: the altitude box and the tank rows in the order of their numbers,
 * each knowing its number. Blank rows stay (the reader drops them), so the rows shown again after a
 * refusal are the rows posted. Fields the form does not have are ignored.
 */
export function waterDraftFrom(values: Iterable<[string, unknown]>): WaterDraft {
	const rows = new Map<number, TankDraft>();
	let altitudeM = '';
	for (const [key, value] of values) {
		if (typeof value !== 'string') continue;
		if (key === 'altitudeM') altitudeM = value;
		const match = ROW.exec(key);
		if (!match) continue;
		const index = Number(match[1]);
		const tank = rows.get(index) ?? { ...blankTank(''), row: index, proteinPercent: '' };
		const field = match[2]!;
		if (field === 'monthlyTemperatureC' && match[3] !== undefined) {
			if (Number(match[3]) < 12) tank.monthlyTemperatureC[Number(match[3])] = value;
		} else if (match[3] !== undefined) continue;
		else if (field === 'byMonth') tank.byMonth = value === 'on';
		else if ((TEXT_FIELDS as readonly string[]).includes(field))
			tank[field as (typeof TEXT_FIELDS)[number]] = value;
		rows.set(index, tank);
	}
	const tanks = [...rows.entries()].sort(([a], [b]) => a - b).map(([, tank]) => tank);
	return { altitudeM, tanks };
}
