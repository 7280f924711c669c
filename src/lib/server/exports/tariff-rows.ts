import type { DemandCharge, EnergyCharge } from '$lib/calc';
import { limitsMonths, monthsText } from '$lib/text/tariff';
import { type SheetWriter, a1, on } from './cells';
import type { Formats } from './formats';
import { touReferenceRows } from './tou-reference-rows';

export type EnergyCells =
	{ perKwh: string } | { tiers: Array<{ uptoKwh: string | null; perKwh: string }>; perDay: boolean } | null;

/** A demand charge's live cells: one price or tiers per kW, and the ratchet's percent when it has one. */
export type DemandCells = ({ perKw: string } | { tiers: Array<{ uptoKw: string | null; perKw: string }> }) & {
	ratchetPercent: string | null;
};

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

	/** A figure shown for reference only (not read by any formula). */
	reference(kind: string, label: string, amount: number, unit: string, when: string, upto?: number): void {
		const { out, row } = this;
		out.text(row, 1, kind);
		out.text(row, 2, label);
		out.number(row, 3, amount, unit === 'kWh' ? this.formats.kwh : this.formats.rate);
		out.text(row, 4, unit);
		if (upto !== undefined) out.number(row, 5, upto, this.formats.kwh);
		out.text(row, 6, `${when} (reference)`);
		this.row++;
	}

	/** A sentence under the table, across its columns. */
	note(text: string): void {
		this.out.line(this.row, text, 6, 'note');
		this.out.sheet.getRow(this.row).height = 45;
		this.row++;
	}

	/** A demand charge's price per kW or its tiers (bound in kW in column E), and its ratchet percent. */
	demand(charge: DemandCharge, words: string): DemandCells {
		const { formats } = this;
		const prices = charge.tiers
			? {
					tiers: charge.tiers.map((tier, i) => {
						const row = this.row;
						const label = `${charge.label}, tier ${i + 1}`;
						const perKw = this.put(
							'Demand, tiered',
							label,
							tier.perKw,
							formats.rate,
							'per kW',
							i ? '' : words
						);
						this.out.number(row, 5, tier.uptoKw, formats.kw, 'input');
						return { uptoKw: tier.uptoKw === null ? null : this.ref(5, row), perKw };
					})
				}
			: { perKw: this.put('Demand', charge.label, charge.perKw ?? 0, formats.rate, 'per kW', words) };
		const { ratchet } = charge;
		const ratchetPercent = ratchet
			? this.put(
					'Demand ratchet',
					`${charge.label}, ratchet`,
					ratchet.percent,
					'0.####',
					'percent',
					'Billing kW is at least this percent of the highest earlier peak the ratchet looks at'
				)
			: null;
		return { ...prices, ratchetPercent };
	}

	energy(charge: EnergyCharge): EnergyCells {
		const { formats } = this;
		if (charge.type === 'tou') {
			touReferenceRows(this, charge);
			return null;
		}
		const only = limitsMonths(charge.months) ? `only in ${monthsText(charge.months)}` : '';
		const perDay = charge.type === 'tiered' && charge.tiersPer === 'day';
		const months = [only, perDay ? 'tier bounds per day, × the days of the month' : '']
			.filter(Boolean)
			.join('; ');
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
		return { tiers, perDay };
	}
}
