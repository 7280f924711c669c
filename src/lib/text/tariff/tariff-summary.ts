/** The tariff page's plain-words description: each charge of a tariff in sentences, grouped by kind. */
import type { AnyTariff } from './rate-phrases';
import { energySentences, fixedText, riderText, taxText } from './charge-sentences';
import { demandText } from './demand-sentences';
import { minimumLines } from './minimum-sentences';

/** One block of the tariff page's plain-words description. */
export interface TariffSection {
	heading: string;
	lines: string[];
}

/** Whether any time-of-use period or demand charge treats weekdays and weekends differently (holidays matter). */
function splitsWeekends(tariff: AnyTariff): boolean {
	const periodDays = (tariff.energyCharges ?? []).flatMap((charge) =>
		charge.type === 'tou' ? charge.seasons.flatMap((season) => season.periods.map((p) => p.days)) : []
	);
	const demandDays = (tariff.demandCharges ?? []).map((charge) => charge.days);
	// A charge of every day with other hours at weekends treats them differently too.
	const weekendHours = (tariff.demandCharges ?? []).some((charge) => charge.weekendWindows !== undefined);
	return weekendHours || [...periodDays, ...demandDays].some((days) => days !== undefined && days !== 'all');
}

/**
 * Each charge of a tariff in plain sentences, grouped by kind; kinds the tariff lacks are left out
 * (a tariff with no charges gives an empty list). Money is in the tariff's currency, per-kWh rates
 * with up to five decimals. For example `{ currency: 'USD', fixedCharges: [{ label: 'Customer
 * charge', perMonth: 12.5 }] }` gives `[{ heading: 'Fixed charges', lines: ['Customer charge:
 * $12.50 a month.'] }]`.
 */
export function describeTariff(tariff: AnyTariff): TariffSection[] {
	const { currency } = tariff;
	const sections: TariffSection[] = [];
	const add = (heading: string, lines: string[]) => {
		if (lines.length > 0) sections.push({ heading, lines });
	};

	add(
		'Fixed charges',
		(tariff.fixedCharges ?? []).map((charge) => `${charge.label}: ${fixedText(charge, currency)}.`)
	);
	add(
		'Energy charges',
		(tariff.energyCharges ?? []).flatMap((charge) => energySentences(charge, currency))
	);
	add(
		'Demand charges',
		(tariff.demandCharges ?? []).map((charge) => `${charge.label}: ${demandText(charge, currency)}.`)
	);
	add(
		'Riders',
		(tariff.riders ?? []).map((rider) => `${rider.label}: ${riderText(rider.perKwh, currency)}.`)
	);
	add(
		'Taxes',
		(tariff.taxes ?? []).map((tax) => `${tax.label}: ${taxText(tax.percent)}.`)
	);
	add('Minimum bill', minimumLines(tariff));
	if (splitsWeekends(tariff)) {
		add('Public holidays', [
			(tariff.holidaysAsWeekends ?? true)
				? 'Holidays price like weekends.'
				: 'Holidays price like the weekday they fall on.'
		]);
	}
	return sections;
}
