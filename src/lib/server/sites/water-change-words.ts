// The change trail's words for a site's water: each tank added, removed or changed, field by field with
// its old and new value ("Tank 'Grow-out 1' volume 1,000 L → 1,200 L", "Added tank 'Sump'").
import type { SiteWater, Tank } from '$lib/calc';
import { figure } from '$lib/text/numbers';
import { canonical } from './change-words';

type TankField = Exclude<keyof Tank, 'id' | 'name'>;

/** A tank's fields in the order the form shows them, each with its words and how its value reads. */
const TANK_FIELDS: [TankField, string, (value: never) => string][] = [
	['volumeLiters', 'volume', (l: number) => `${figure(l, 1)} L`],
	['depthM', 'depth', (m: number) => `${figure(m, 2)} m`],
	['water', 'water', (w: string) => (w === 'sea' ? 'sea water' : 'fresh water')],
	[
		'salinityGPerKg',
		'salinity',
		(s: number | undefined) => (s === undefined ? 'the usual' : `${figure(s, 1)} g/kg`)
	],
	['temperatureC', 'water temperature', (c: number) => `${figure(c, 1)} °C`],
	['monthlyTemperatureC', 'monthly temperatures', monthsText],
	['fishKg', 'fish', (kg: number) => `${figure(kg, 1)} kg`],
	['feedKgPerDay', 'daily feed', (kg: number) => `${figure(kg, 2)} kg/day`],
	['proteinPercent', 'feed protein', (p: number) => `${figure(p, 1)} %`]
];

/** Twelve temperatures in a line: "none" when one value holds all year. */
function monthsText(months: number[] | null | undefined): string {
	return months ? months.map((c) => figure(c, 1)).join(', ') + ' °C' : 'none';
}

const named = (tank: Pick<Tank, 'name'>) => `'${tank.name}'`;

/** One tank's changes: "Tank 'Sump' volume 500 L → 600 L, depth 1 m → 1.2 m", or null when it is the same. */
function tankChange(before: Tank, after: Tank): string | null {
	const parts: string[] = [];
	if (before.name !== after.name) parts.push(`renamed ${named(after)}`);
	for (const [field, words, show] of TANK_FIELDS) {
		const [from, to] = [before[field], after[field]];
		// A row stored before a field existed has no value for it: say "none" rather than a bad figure.
		const say = (v: unknown) => (v == null && field !== 'salinityGPerKg' ? 'none' : show(v as never));
		if (canonical(from) !== canonical(to)) parts.push(`${words} ${say(from)} → ${say(to)}`);
	}
	return parts.length ? `Tank ${named(before)} ${parts.join(', ')}` : null;
}

/**
 * A site's water changes in words, one phrase a change: the altitude, then each tank of the new list in
 * its order (added or changed), then each tank removed. Tanks are matched by id, so a renamed tank
 * reads as renamed, not as one removed and another added. An unchanged water gives no phrases.
 */
export function waterChangeWords(before: SiteWater, after: SiteWater): string[] {
	const words: string[] = [];
	if (canonical(before.altitudeM) !== canonical(after.altitudeM))
		words.push(`Altitude ${figure(before.altitudeM, 0)} m → ${figure(after.altitudeM, 0)} m`);
	const old = new Map(before.tanks.map((t) => [t.id, t]));
	for (const tank of after.tanks) {
		const was = old.get(tank.id);
		const change = was ? tankChange(was, tank) : `Added tank ${named(tank)}`;
		if (change) words.push(change);
	}
	const kept = new Set(after.tanks.map((t) => t.id));
	for (const tank of before.tanks) if (!kept.has(tank.id)) words.push(`Removed tank ${named(tank)}`);
	return words;
}
