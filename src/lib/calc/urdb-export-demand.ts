import type { DemandCharge } from './tariff.schema';
import { type ExportNote, IndexBook, filledGrid, gridsOf, windowHours } from './urdb-export-grid';

const ALL_MONTHS = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12];

/** A demand charge's price as URDB tiers (kW bounds, the last unbounded). */
const tiersOf = (charge: DemandCharge) =>
	charge.tiers
		? charge.tiers.map((t) => (t.uptoKw === null ? { rate: t.perKw } : { rate: t.perKw, max: t.uptoKw }))
		: [{ rate: charge.perKw ?? 0 }];

/**
 * Whether a charge takes the month's peak at any hour of any day with no windows named (URDB's flat
 * demand); one with windows, even all day, goes to the time-of-use demand schedules, as it came.
 */
const wholeMonth = (c: DemandCharge) => c.days === 'all' && (!c.windows || c.windows.length === 0);

/** A ratchet in URDB's fields: 12 equal monthly fractions for 11 months back, else the lookback fields. */
function ratchetFields(ratchet: NonNullable<DemandCharge['ratchet']>): Record<string, unknown> {
	const fraction = ratchet.percent / 100;
	if (ratchet.monthsBack === 11) return { demandratchetpercentage: Array(12).fill(fraction) };
	if (ratchet.monthsBack) return { lookbackPercent: fraction, lookbackRange: ratchet.monthsBack };
	return {
		lookbackPercent: fraction,
		lookbackRange: 0,
		lookbackMonths: ALL_MONTHS.map((m) => !!ratchet.months?.includes(m))
	};
}

/** Whole-month charges as `flatdemandstructure` + `flatdemandmonths` (months without one at a zero price). */
function flatFields(charges: DemandCharge[], notes: ExportNote[]): Record<string, unknown> {
	if (charges.length === 0) return {};
	const book = new IndexBook(/^Demand (\d+)$/);
	book.reserve(charges.map((c) => c.label));
	const months = Array<number>(12).fill(-1);
	for (const charge of charges) {
		const index = book.index(JSON.stringify(tiersOf(charge)), charges.length > 1 ? charge.label : null);
		for (const month of charge.months ?? ALL_MONTHS) {
			if (months[month - 1] !== -1)
				notes.push({
					field: 'demandCharges',
					message: `"${charge.label}" overlaps another whole-month demand charge in month ${month}; not written there`
				});
			else months[month - 1] = index;
		}
	}
	if (months.includes(-1)) {
		const none = book.index(JSON.stringify([{ rate: 0 }]), null);
		months.forEach((m, i) => m === -1 && (months[i] = none));
	}
	const ratchets = new Set(charges.map((c) => JSON.stringify(c.ratchet ?? null)));
	const ratchet = charges[0]?.ratchet;
	if (ratchets.size > 1)
		notes.push({
			field: 'demandCharges',
			message: 'Whole-month demand charges with different ratchets: not written'
		});
	return {
		flatdemandstructure: book.structure((k) => JSON.parse(k) as unknown, [{ rate: 0 }]),
		flatdemandmonths: months,
		...(ratchet && ratchets.size === 1 ? ratchetFields(ratchet) : {})
	};
}

/** Charges with windows or days as `demandratestructure` and its 12 × 24 schedules (other hours at zero). */
function touFields(charges: DemandCharge[], notes: ExportNote[]): Record<string, unknown> {
	if (charges.length === 0) return {};
	const book = new IndexBook(/^Demand, period (\d+)$/);
	book.reserve(charges.map((c) => c.label));
	const indexes = charges.map((c) => book.index(JSON.stringify(tiersOf(c)) + c.label, c.label));
	const none = book.index(JSON.stringify([{ rate: 0 }]), null);
	const grids = [filledGrid(none), filledGrid(none)];
	charges.forEach((charge, i) => {
		// Weekend windows, when given, fill the weekend grid instead of the weekday windows.
		const hoursOf = [windowHours(charge.windows), windowHours(charge.weekendWindows ?? charge.windows)];
		if (hoursOf.some((h) => !h.whole))
			notes.push({ field: 'demandCharges', message: `"${charge.label}": windows written to whole hours` });
		if (charge.ratchet)
			notes.push({
				field: 'demandCharges',
				message: `"${charge.label}": a ratchet on a time-of-use demand charge is not written`
			});
		for (const month of charge.months ?? ALL_MONTHS)
			for (const g of gridsOf(charge.days))
				for (const hour of hoursOf[g]!.hours) {
					const row = grids[g]![month - 1]!;
					if (row[hour] !== none)
						notes.push({
							field: 'demandCharges',
							message: `"${charge.label}" overlaps another demand charge in month ${month}; not written there`
						});
					else row[hour] = indexes[i]!;
				}
	});
	return {
		demandratestructure: book.structure(
			(k) => JSON.parse(k.slice(0, k.lastIndexOf(']') + 1)) as unknown,
			[{ rate: 0 }]
		),
		demandweekdayschedule: grids[0],
		demandweekendschedule: grids[1]
	};
}

/** A tariff's demand charges in the open rate database's shape, with notes on what could not be written. */
export function demandFields(charges: readonly DemandCharge[], notes: ExportNote[]): Record<string, unknown> {
	if (charges.length === 0) return {};
	const minutes = new Set(charges.map((c) => c.intervalMinutes));
	if (minutes.size > 1)
		notes.push({
			field: 'demandCharges',
			message: 'Demand charges with different intervals: all written with the first one'
		});
	return {
		demandunits: 'kW',
		demandwindow: charges[0]!.intervalMinutes,
		...flatFields(charges.filter(wholeMonth), notes),
		...touFields(
			charges.filter((c) => !wholeMonth(c)),
			notes
		)
	};
}
