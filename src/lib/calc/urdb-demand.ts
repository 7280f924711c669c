import { gridSeasons, hourWindows } from './hour-grid';
import type { TariffInput } from './tariff.schema';
import type { UrdbRate } from './urdb.schema';
import { type ImportNote, type UrdbTier, price } from './urdb-energy';
import { ratchet } from './urdb-ratchet';

type DemandInput = NonNullable<TariffInput['demandCharges']>[number];

/** One URDB demand period's tiers as a single price per kW or Runrate demand tiers (kW bounds). */
function demandPrice(tiers: UrdbTier[]): Pick<DemandInput, 'perKw' | 'tiers'> {
	if (tiers.length === 1) return { perKw: price(tiers[0]!) };
	return {
		tiers: tiers.map((t, i) => ({ uptoKw: i === tiers.length - 1 ? null : (t.max ?? null), perKw: price(t) }))
	};
}

const free = (tiers: UrdbTier[]) => tiers.every((t) => price(t) === 0);

/**
 * URDB's `demandwindow` (minutes) as Runrate's demand interval: 15 and 60 as they are; 30 is priced on
 * 15-minute peaks (never lower than 30-minute ones, so the bill is not understated) with a note.
 */
function interval(rate: UrdbRate, notes: ImportNote[]): 15 | 60 {
	const minutes = rate.demandwindow ?? 15;
	if (minutes === 15 || minutes === 60) return minutes;
	notes.push({
		code: 'demand-window',
		field: 'demandwindow',
		message: `A ${minutes}-minute demand window is priced on 15-minute peaks, which can be a little higher`
	});
	return 15;
}

/** Whole-month demand: one charge per flat demand period used by `flatdemandmonths`. */
function flatCharges(
	rate: UrdbRate,
	minutes: 15 | 60,
	notes: ImportNote[]
): (DemandInput & { months: number[] })[] | null {
	const structure = rate.flatdemandstructure;
	if (!structure) return [];
	const months = rate.flatdemandmonths ?? (structure.length === 1 ? Array(12).fill(0) : null);
	if (!months) {
		notes.push({
			code: 'flat-demand-months',
			field: 'flatdemandmonths',
			message: 'Several flat demand periods but no months to say when each applies; the rate was not imported'
		});
		return null;
	}
	const used = [...new Set(months)].sort((a, b) => a - b).filter((i) => !free(structure[i]!));
	return used.map((index) => ({
		label: used.length === 1 ? 'Demand' : `Demand ${index + 1}`,
		...demandPrice(structure[index]!),
		intervalMinutes: minutes,
		months: months.flatMap((m, month) => (m === index ? [month + 1] : []))
	}));
}

/**
 * Time-of-use demand: each period's hours by day type, per season; a period whose windows are the same
 * in several seasons becomes one charge listing all their months. A period with hours on both kinds of
 * day but different ones (weekday nights and whole weekends) is one charge of every day, its weekday
 * hours in `windows` and its weekend hours in `weekendWindows`, so its one peak spans both.
 */
function touCharges(rate: UrdbRate, minutes: 15 | 60): DemandInput[] {
	const structure = rate.demandratestructure;
	if (!structure) return [];
	const weekday = rate.demandweekdayschedule!;
	const weekend = rate.demandweekendschedule!;
	const charges = new Map<string, DemandInput & { months: number[] }>();
	for (const season of gridSeasons(weekday, weekend)) {
		const first = season.months[0]! - 1;
		const indexes = [season.otherIndex, ...season.periods.map((p) => p.index)];
		for (const index of [...new Set(indexes)].sort((a, b) => a - b)) {
			if (free(structure[index]!)) continue;
			const onWeekdays = weekday[first]!.flatMap((v, h) => (v === index ? [h] : []));
			const onWeekends = weekend[first]!.flatMap((v, h) => (v === index ? [h] : []));
			const same = onWeekdays.join() === onWeekends.join();
			const split = !same && onWeekdays.length > 0 && onWeekends.length > 0;
			const days = same || split ? 'all' : onWeekdays.length > 0 ? 'weekdays' : 'weekends';
			const windows = hourWindows(onWeekdays.length > 0 ? onWeekdays : onWeekends);
			const weekendWindows = split ? hourWindows(onWeekends) : undefined;
			const key = `${index}|${days}|${JSON.stringify(windows)}|${JSON.stringify(weekendWindows)}`;
			const found = charges.get(key);
			if (found) found.months.push(...season.months);
			else
				charges.set(key, {
					label: `Demand, period ${index + 1}`,
					...demandPrice(structure[index]!),
					intervalMinutes: minutes,
					months: [...season.months],
					days,
					windows,
					...(weekendWindows ? { weekendWindows } : {})
				});
		}
	}
	return [...charges.values()].map((c) => ({ ...c, months: c.months.sort((a, b) => a - b) }));
}

/** The rate's demand charges, or null when they cannot be expressed (the notes say why). */
export function demandCharges(rate: UrdbRate, notes: ImportNote[]): DemandInput[] | null {
	if (!rate.flatdemandstructure && !rate.demandratestructure) return [];
	if (rate.demandunits && rate.demandunits !== 'kW') {
		notes.push({
			code: 'demand-unit',
			field: 'demandunits',
			message: `Demand in "${rate.demandunits}" cannot be priced by Runrate (it meters kW); the rate was not imported`
		});
		return null;
	}
	const minutes = interval(rate, notes);
	const flat = flatCharges(rate, minutes, notes);
	const tou = touCharges(rate, minutes);
	const held = ratchet(rate, notes);
	if (!flat || held === null) return null;
	if (held && flat.length === 0) {
		notes.push({
			code: 'ratchet-without-demand',
			field: 'demandratchetpercentage',
			message: 'A ratchet needs a whole-month demand charge to apply to; the rate was not imported'
		});
		return null;
	}
	return [...flat.map((c) => (held ? { ...c, ratchet: held } : c)), ...tou];
}
