import type { Tariff } from '$lib/calc';
import { demandText, riderText, taxText } from '$lib/text/tariff';
import type { SheetWriter } from './cells';
import { formatsFor } from './formats';
import { type TariffOrigin, writeTariffOrigin } from './tariff-provenance';
import { type DemandCells, type EnergyCells, TariffRows } from './tariff-rows';
import { valueReasons } from './value-lines';

/** Where a tariff's figures sit on the Tariff sheet, as fixed references the other sheets use. */
export interface TariffCells {
	tariff: Tariff;
	fixed: Array<{ perMonth: string } | { perDay: string } | { perYear: string }>;
	/** Per energy charge: a flat rate, tier rows, or null for time-of-use (priced through computed values). */
	energy: EnergyCells[];
	demand: DemandCells[];
	riders: string[];
	/** The riders' sum per kWh, and the taxes' sum as a fraction (null when the tariff has none). */
	ridersPerKwh: string | null;
	taxRate: string | null;
	taxes: string[];
	/** The minimum bills: per month, per day (× the days), per year (on the run of 12 periods). */
	minimum: string | null;
	minimumPerDay: string | null;
	minimumPerYear: string | null;
}

export interface TariffUse {
	tariff: Tariff;
	name: string;
	version: number | null;
	scenarios: string[];
	/** Where the version comes from; null when the comparison did not say (then no rows are written). */
	origin: TariffOrigin | null;
}

const sum = (values: readonly number[]) => values.reduce((total, value) => total + value, 0);

const MINIMUM_NOTE = 'A minimum line adds the difference when the subtotal is below it';
const DAILY_MINIMUM_NOTE =
	'× the days of the month; with a monthly minimum too, the larger of the two is the floor';
const YEARLY_MINIMUM_NOTE =
	'On the 12 months together (n/12 of it for fewer): the last month adds what their bills before tax fall short';
const COLUMNS = ['Kind', 'Charge', 'Rate or amount', 'Unit', 'Up to (kWh or kW)', 'When, and notes'];

/** Writes one block per distinct tariff; answers the cells of each, in the order given. */
export function writeTariffSheet(out: SheetWriter, uses: readonly TariffUse[]): TariffCells[] {
	out.widths([20, 30, 16, 12, 12, 90]);
	out.line(
		1,
		'Tariffs used in this comparison (invented or as entered; check them against your own)',
		6,
		'title'
	);
	out.line(
		2,
		'Pale cells are live: change a rate, tier, rider, tax or minimum and the Monthly sheet and the Summary follow. Time-of-use rates are shown for reference only: the scenario sheets hold their price-weighted hours as computed values, so changing a time-of-use rate here does not recalculate them.',
		6,
		'note'
	);
	out.sheet.getRow(2).height = 45;
	let row = 4;
	return uses.map((use) => {
		const written = writeBlock(out, use, row);
		row = written.next + 1;
		return written.cells;
	});
}

function writeBlock(out: SheetWriter, use: TariffUse, start: number): { cells: TariffCells; next: number } {
	const { tariff } = use;
	const { currency } = tariff;
	const formats = formatsFor(currency);
	const version = use.version === null ? 'no version number' : `version ${use.version}`;
	out.text(start, 1, `${use.name} (${version})`, 'heading');
	out.text(start + 1, 1, `Used by: ${use.scenarios.join('; ')}`);
	const about = use.origin ? writeTariffOrigin(out, use.origin, start + 2) : start + 2;
	const holidays = tariff.holidaysAsWeekends ? 'yes' : 'no';
	out.text(about, 1, `Currency ${currency}. Public holidays price as weekends: ${holidays}.`);
	out.headers(about + 1, 1, COLUMNS);
	const rows = new TariffRows(out, formats, about + 2);
	const fixed = tariff.fixedCharges.map((charge) => {
		if (charge.perMonth !== undefined) {
			return { perMonth: rows.put('Fixed', charge.label, charge.perMonth, formats.money, 'per month') };
		}
		if (charge.perYear !== undefined) {
			const note = 'A twelfth each month';
			return { perYear: rows.put('Fixed', charge.label, charge.perYear, formats.money, 'per year', note) };
		}
		return { perDay: rows.put('Fixed', charge.label, charge.perDay ?? 0, formats.money, 'per day') };
	});
	const energy = tariff.energyCharges.map((charge) => rows.energy(charge));
	const demand = tariff.demandCharges.map((charge) => rows.demand(charge, demandText(charge, currency)));
	const riders = tariff.riders.map((rider) =>
		rows.put('Rider', rider.label, rider.perKwh, formats.rate, 'per kWh', riderText(rider.perKwh, currency))
	);
	const floor = (amount: number | null | undefined, label: string, unit: string, note: string) =>
		amount != null ? rows.put('Minimum bill', label, amount, formats.money, unit, note) : null;
	const minimum = floor(tariff.minimumMonthly, 'Minimum monthly', 'per month', MINIMUM_NOTE);
	const minimumPerDay = floor(tariff.minimumPerDay, 'Minimum per day', 'per day', DAILY_MINIMUM_NOTE);
	const minimumPerYear = floor(tariff.minimumPerYear, 'Minimum per year', 'per year', YEARLY_MINIMUM_NOTE);
	const taxes = tariff.taxes.map((tax) =>
		rows.put('Tax', tax.label, tax.percent, '0.####', 'percent', taxText(tax.percent))
	);
	// The core adds the riders per kWh, and the taxes as fractions, before it allocates them to devices.
	const riderSum = sum(tariff.riders.map((rider) => rider.perKwh));
	const ridersPerKwh =
		riders.length > 0 ? rows.helper('Riders together', riders.join('+'), riderSum, formats.rate) : null;
	const taxSum = sum(tariff.taxes.map((tax) => tax.percent / 100));
	const taxFormula = taxes.map((tax) => `${tax}/100`).join('+');
	const taxRate =
		taxes.length > 0 ? rows.helper('Taxes together (fraction)', taxFormula, taxSum, formats.fraction) : null;
	for (const reason of valueReasons(tariff)) rows.note(reason);
	return {
		cells: {
			tariff,
			fixed,
			energy,
			demand,
			riders,
			ridersPerKwh,
			taxRate,
			taxes,
			minimum,
			minimumPerDay,
			minimumPerYear
		},
		next: rows.row
	};
}
