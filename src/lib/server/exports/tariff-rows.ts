import type { EnergyCharge } from '$lib/calc';
import { limitsMonths, monthsText, whenText } from '$lib/text/tariff';
import { type SheetWriter, a1, on } from './cells';
import type { Formats } from './formats';

export type EnergyCells =
	{ perKwh: string } | { tiers: Array<{ uptoKwh: string | null; perKwh: string }> } | null;

/**
 * The rows of one tariff's table, from `row` down: kind, charge, rate or amount (pale: live), unit,
 * up to kWh (tiers), and when it applies. Each live figure answers its fixed reference.
 */
export class TariffRows {
	constructor(
		private readonly out: SheetWriter,
		private readonly formats: Formats,
		public row: number
	) {}

	private ref(col: number, row: number): string {
		return on(this.out.name, a1(col, row, true));
	}

	/** A live rate or amount. */
	put(kind: string, label: string, amount: number, format: string, unit: string, notes = ''): string {
		const { out, row } = this;
		out.text(row, 1, kind);
		out.text(row, 2, label);
		out.number(row, 3, amount, format, 'input');
		out.text(row, 4, unit);
		if (notes) out.text(row, 6, notes);
		this.row++;
		return this.ref(3, row);
	}

	/** A figure the tariff does not state but the formulas use (riders together, taxes together). */
	helper(label: string, formula: string, result: number, format: string): string {
		const { out, row } = this;
		out.text(row, 2, label, 'bold');
		out.formula(row, 3, formula, result, format);
		this.row++;
		return this.ref(3, row);
	}

	/** A time-of-use rate, for reference: its price-weighted hours are values on the scenario sheets. */
	private reference(label: string, perKwh: number, when: string): void {
		const { out, row } = this;
		out.text(row, 1, 'Energy, time-of-use');
		out.text(row, 2, label);
		out.number(row, 3, perKwh, this.formats.rate);
		out.text(row, 4, 'per kWh');
		out.text(row, 6, `${when} (reference)`);
		this.row++;
	}

	energy(charge: EnergyCharge): EnergyCells {
		const { formats } = this;
		if (charge.type === 'tou') {
			for (const season of charge.seasons) {
				const months = monthsText(season.months);
				for (const period of season.periods) {
					this.reference(
						`${charge.label}: ${period.label}`,
						period.perKwh,
						`${months}, ${whenText(period.days, period.windows)}`
					);
				}
				this.reference(
					`${charge.label}: other times`,
					season.otherPerKwh,
					`${months}, outside the periods above`
				);
			}
			return null;
		}
		const months = limitsMonths(charge.months) ? `only in ${monthsText(charge.months)}` : '';
		if (charge.type === 'flat') {
			return {
				perKwh: this.put('Energy, flat', charge.label, charge.perKwh, formats.rate, 'per kWh', months)
			};
		}
		const tiers = charge.tiers.map((tier, i) => {
			const row = this.row;
			const perKwh = this.put(
				'Energy, tiered',
				`${charge.label}, tier ${i + 1}`,
				tier.perKwh,
				formats.rate,
				'per kWh',
				months
			);
			this.out.number(row, 5, tier.uptoKwh, formats.kwh, 'input');
			return { uptoKwh: tier.uptoKwh === null ? null : this.ref(5, row), perKwh };
		});
		return { tiers };
	}
}
