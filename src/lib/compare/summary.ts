import { figure, moneyWhole } from '$lib/text/numbers';
import { PAYBACK_WORDS } from '$lib/text/output-labels';
import { emissionFactorSet, paybackYearsFigure } from './format';
import type { ComparisonReport } from './types';

/**
 * The comparison in sentences a grant writer can paste: for each scenario against the baseline,
 * what it saves a year, when the extra purchase pays back and what it comes to over the horizon.
 * Amounts are rounded to whole currency units ("about"); the tables hold the cents.
 */
export const money = moneyWhole;

const whole = (n: number) => figure(n, 0);

/** "pays back in about 0.74 years (9 months)": years as the tables give them, months while under two years. */
function paybackWords(years: number): string {
	if (years === 0) return `pays back ${PAYBACK_WORDS.atOnce}`;
	const months = Math.round(years * 12);
	if (months < 1) return `pays back in about ${paybackYearsFigure(years)} (under a month)`;
	if (months < 24)
		return `pays back in about ${paybackYearsFigure(years)} (${months} ${months === 1 ? 'month' : 'months'})`;
	return `pays back in about ${paybackYearsFigure(years)}`;
}

/**
 * What is installed is already paid for: its year 0 holds only its one-off costs, which a reader
 * needs to know before the payback makes sense.
 */
function statusSentences(report: ComparisonReport): string[] {
	const { result, scenarios, currency } = report;
	return result.scenarios.flatMap((r, i) => {
		if (r.status !== 'installed') return [];
		const name = scenarios[i]?.name ?? r.name;
		const oneOff = r.capitalCost;
		return [
			`“${name}” is what is installed now: it is already paid for, so its purchase and installation counts only ${
				Math.abs(oneOff) < 0.5
					? 'its one-off costs (none)'
					: `its one-off costs of about ${money(oneOff, currency)}`
			}, and its devices are bought again only when their life ends within the horizon.`
		];
	});
}

export function summarySentences(report: ComparisonReport): string[] {
	const { result, scenarios, baseline, currency, query } = report;
	const base = result.scenarios[baseline];
	const baseName = scenarios[baseline]?.name ?? 'the baseline';
	if (!base) return [];
	const m = (amount: number) => money(Math.abs(amount), currency);
	const perScenario = result.scenarios.flatMap((r, i) => {
		if (i === baseline) return [];
		const name = scenarios[i]?.name ?? r.name;
		const kwh = base.annualKwh - r.annualKwh;
		const extra = r.capitalCost - base.capitalCost;
		const lifecycle = base.lifecycleCost - r.lifecycleCost;
		const parts: string[] = [];
		if (Math.abs(r.savingsPerYear) < 0.5) {
			parts.push(`“${name}” costs about the same to run as “${baseName}”.`);
		} else if (r.savingsPerYear > 0) {
			const pct = base.annualCost > 0 ? ` (${whole((r.savingsPerYear / base.annualCost) * 100)} %)` : '';
			parts.push(
				`Choosing “${name}” instead of “${baseName}” saves about ${m(r.savingsPerYear)} a year${pct} on the electricity bill and ${whole(kwh)} kWh.`
			);
		} else {
			parts.push(
				`“${name}” costs about ${m(r.savingsPerYear)} a year more to run than “${baseName}” (${whole(-kwh)} kWh more).`
			);
		}
		if (extra > 0.5 && r.simplePaybackYears !== null) {
			parts.push(`The extra purchase and installation of ${m(extra)} ${paybackWords(r.simplePaybackYears)}.`);
		} else if (extra > 0.5) {
			parts.push(`It costs ${m(extra)} more to buy and install, which the running costs never pay back.`);
		} else if (extra < -0.5) {
			parts.push(`It also costs ${m(extra)} less to buy and install, so it ${paybackWords(0)}.`);
		} else if (r.simplePaybackYears === 0) {
			parts.push(`It ${paybackWords(0)}.`);
		}
		parts.push(
			Math.abs(lifecycle) < 0.5
				? `Over ${query.horizonYears} years the two come to about the same.`
				: `Over ${query.horizonYears} years, counting maintenance and replacements and discounting at ${query.discountPercent} % a year, it comes to ${m(lifecycle)} ${lifecycle > 0 ? 'less' : 'more'} in today’s money.`
		);
		if (emissionFactorSet(query) && Math.abs(kwh) >= 1) {
			const co2 = base.co2KgPerYear - r.co2KgPerYear;
			parts.push(`That is about ${whole(Math.abs(co2))} kg of CO₂ a year ${co2 > 0 ? 'less' : 'more'}.`);
		}
		return [parts.join(' ')];
	});
	return [...statusSentences(report), ...perScenario];
}
