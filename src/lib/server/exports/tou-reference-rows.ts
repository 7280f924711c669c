/** A time-of-use charge on the Tariff sheet: each period's prices (and tiers) for reference only. */
import type { EnergyCharge } from '$lib/calc';
import { monthsText, whenText } from '$lib/text/tariff';
import type { TariffRows } from './tariff-rows';

type TouCharge = Extract<EnergyCharge, { type: 'tou' }>;

/**
 * One row per period and season's other hours, and with tier limits one more per price above each
 * limit. They are for reference: the scenario sheets hold the time-of-use figures Runrate computed.
 */
export function touReferenceRows(rows: TariffRows, charge: TouCharge): void {
	const kind = 'Energy, time-of-use';
	const perDay = charge.tiersPer === 'day' ? ' a day (× the days of the month)' : '';
	for (const season of charge.seasons) {
		const months = monthsText(season.months);
		const limits = season.tierLimitsKwh ?? [];
		const slot = (label: string, first: number, above: readonly number[] | undefined, when: string) => {
			const upto = limits.length > 0 ? limits[0] : undefined;
			rows.reference(kind, `${charge.label}: ${label}`, first, 'per kWh', `${months}, ${when}`, upto);
			limits.forEach((limit, i) => {
				const next = limits[i + 1];
				const band = `above ${limit} kWh${perDay} of the season's periods together`;
				rows.reference(
					kind,
					`${charge.label}: ${label}, tier ${i + 2}`,
					above?.[i] ?? 0,
					'per kWh',
					band,
					next
				);
			});
		};
		for (const period of season.periods) {
			slot(period.label, period.perKwh, period.abovePerKwh, whenText(period.days, period.windows));
		}
		slot('other times', season.otherPerKwh, season.otherAbovePerKwh, 'outside the periods above');
	}
}
