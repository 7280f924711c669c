/** The version history's words: what changed between two versions of a tariff, one line per change. */
import { type AnyTariff, figureText, moneyText } from './rate-phrases';
import { type FixedInput, energySentences, fixedText } from './charge-sentences';
import { demandText } from './demand-sentences';
import { demandChanges } from './demand-diff';
import { type Labelled, diffList, energyChanges } from './diff-parts';

const fixedUnit = (charge: FixedInput) =>
	charge.perMonth !== undefined ? 'a month' : charge.perYear !== undefined ? 'a year' : 'a day';

/** "$12.50 → $14.00 a month", or "$12.50 a month → $0.45 a day" when the charge changes kind. */
function fixedChanges(a: FixedInput, b: FixedInput, ca: string, cb: string): string[] {
	if (fixedText(a, ca) === fixedText(b, cb)) return [];
	if (fixedUnit(a) !== fixedUnit(b)) return [`${b.label}: ${fixedText(a, ca)} → ${fixedText(b, cb)}`];
	const amount = (charge: FixedInput) => charge.perMonth ?? charge.perDay ?? charge.perYear ?? 0;
	return [`${b.label}: ${moneyText(amount(a), ca)} → ${moneyText(amount(b), cb)} ${fixedUnit(b)}`];
}

const MINIMUMS = [
	['minimumMonthly', 'Minimum bill', 'a month'],
	['minimumPerDay', 'Daily minimum bill', 'a day'],
	['minimumPerYear', 'Yearly minimum bill', 'a year']
] as const;

/** "Added minimum bill $15.00 a month", "Yearly minimum bill: $200.00 → $240.00 a year", "… removed". */
function minimumChanges(before: AnyTariff, after: AnyTariff): string[] {
	return MINIMUMS.flatMap(([key, name, unit]) => {
		const a = before[key] ?? null;
		const b = after[key] ?? null;
		if (a === null && b !== null)
			return [`Added ${name.toLowerCase()} ${moneyText(b, after.currency)} ${unit}`];
		if (a !== null && b === null) return [`${name} removed`];
		if (a === null || b === null || a === b) return [];
		return [`${name}: ${moneyText(a, before.currency)} → ${moneyText(b, after.currency)} ${unit}`];
	});
}

/**
 * What changed between two versions of a tariff, one plain line per change, for the version
 * history: "Energy: $0.18 → $0.19 per kWh", "Added rider Fuel adjustment $0.031 per kWh",
 * "Customer charge removed". Charges are matched by label; no change gives an empty list.
 */
export function describeTariffDiff(before: AnyTariff, after: AnyTariff): string[] {
	const ca = before.currency;
	const cb = after.currency;
	const lines: string[] = [];
	if (ca.trim().toUpperCase() !== cb.trim().toUpperCase()) lines.push(`Currency: ${ca} → ${cb}`);
	if ((before.holidaysAsWeekends ?? true) !== (after.holidaysAsWeekends ?? true)) {
		lines.push(
			(after.holidaysAsWeekends ?? true)
				? 'Holidays now price like weekends'
				: 'Holidays now price like the weekday they fall on'
		);
	}
	const removed = (item: Labelled) => `${item.label} removed`;
	lines.push(
		...diffList(before.fixedCharges ?? [], after.fixedCharges ?? [], {
			added: (charge) => `Added fixed charge ${charge.label} ${fixedText(charge, cb)}`,
			removed,
			changed: (x, y) => fixedChanges(x, y, ca, cb)
		}),
		...diffList(before.energyCharges ?? [], after.energyCharges ?? [], {
			added: (charge) => `Added energy charge ${energySentences(charge, cb).join(' ')}`,
			removed,
			changed: (x, y) => energyChanges(x, y, ca, cb)
		}),
		...diffList(before.demandCharges ?? [], after.demandCharges ?? [], {
			added: (charge) => `Added demand charge ${charge.label} ${demandText(charge, cb)}`,
			removed,
			changed: (x, y) => demandChanges(x, y, ca, cb)
		}),
		...diffList(before.riders ?? [], after.riders ?? [], {
			added: (rider) => `Added rider ${rider.label} ${moneyText(rider.perKwh, cb)} per kWh`,
			removed,
			changed: (x, y) =>
				x.perKwh === y.perKwh
					? []
					: [`${y.label}: ${moneyText(x.perKwh, ca)} → ${moneyText(y.perKwh, cb)} per kWh`]
		}),
		...diffList(before.taxes ?? [], after.taxes ?? [], {
			added: (tax) => `Added tax ${tax.label} ${figureText(tax.percent)}% of the bill before tax`,
			removed,
			changed: (x, y) =>
				x.percent === y.percent ? [] : [`${y.label}: ${figureText(x.percent)}% → ${figureText(y.percent)}%`]
		})
	);
	lines.push(...minimumChanges(before, after));
	return lines;
}
