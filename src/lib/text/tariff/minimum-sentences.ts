/** A tariff's minimum bills in words: per month, per day of the billing period, per year of 12 periods. */
import { type AnyTariff, moneyText } from './rate-phrases';

/** "$15.00 a month", "$0.50 a day", "$240.00 a year": each minimum the tariff sets, in its words. */
export function minimumAmounts(tariff: AnyTariff): string[] {
	const { currency } = tariff;
	const amounts: string[] = [];
	if (tariff.minimumMonthly != null) amounts.push(`${moneyText(tariff.minimumMonthly, currency)} a month`);
	if (tariff.minimumPerDay != null) {
		amounts.push(`${moneyText(tariff.minimumPerDay, currency)} a day of the billing period`);
	}
	if (tariff.minimumPerYear != null) amounts.push(`${moneyText(tariff.minimumPerYear, currency)} a year`);
	return amounts;
}

/**
 * The minimum bill section: each minimum, then how it applies. Monthly and daily minimums are floors on
 * each bill before tax, fixed charges included (the larger of the two when both are set); the yearly
 * minimum is checked on each run of 12 billing periods and tops up the run's last one.
 */
export function minimumLines(tariff: AnyTariff): string[] {
	const amounts = minimumAmounts(tariff);
	if (amounts.length === 0) return [];
	const lines = amounts.map((amount) => `Minimum bill: ${amount}.`);
	const monthly = tariff.minimumMonthly != null;
	const daily = tariff.minimumPerDay != null;
	if (monthly && daily) {
		lines.push(
			'If the charges before tax come to less than the larger of the monthly amount and the daily amount × the days of the billing period, the bill is raised to it before tax is added.'
		);
	} else if (daily) {
		lines.push(
			'If the charges before tax come to less than the daily amount × the days of the billing period, the bill is raised to it before tax is added.'
		);
	} else if (monthly) {
		lines.push(
			'If the charges before tax come to less, the bill is raised to this amount before tax is added.'
		);
	}
	if (tariff.minimumPerYear != null) {
		lines.push(
			'The yearly minimum is checked on each run of 12 billing periods (a shorter last run on its share, n/12): if their bills before tax come to less, the last bill of the run is raised by the difference before tax is added.'
		);
	}
	return lines;
}
