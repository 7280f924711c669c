import {
	type DemandChargeInput,
	type EnergyChargeInput,
	type FixedChargeInput,
	type RiderInput,
	type TaxInput,
	blankDemandCharge,
	blankEnergyCharge,
	blankFixedCharge,
	blankRider,
	blankTax
} from './tariff-blanks';

/** What a list of the tariff is called, how it is explained, and what "add" puts in it. */
export interface TariffList<T> {
	title: string;
	/** One line in the trade's words: what this part of a tariff is. */
	hint: string;
	/** The list's key in the tariff, the start of its items' paths ("riders.0"). */
	path: string;
	addLabel: string;
	blank: () => T;
}

// The editor's five lists in one place, so each section of the form is one line where it is laid out.

export const FIXED_CHARGES: TariffList<FixedChargeInput> = {
	title: 'Fixed charges',
	hint: 'A fixed (customer) charge is billed whatever the usage: once a month, or for each day of the billing period.',
	path: 'fixedCharges',
	addLabel: 'Add a fixed charge',
	blank: blankFixedCharge
};

export const ENERGY_CHARGES: TariffList<EnergyChargeInput> = {
	title: 'Energy charges',
	hint: 'Energy charges are billed per kWh used. Several add up, such as supply plus delivery.',
	path: 'energyCharges',
	addLabel: 'Add an energy charge',
	blank: () => blankEnergyCharge()
};

export const DEMAND_CHARGES: TariffList<DemandChargeInput> = {
	title: 'Demand charges',
	hint: "A demand charge is billed per kW of the month's highest draw, averaged over 15 minutes or an hour.",
	path: 'demandCharges',
	addLabel: 'Add a demand charge',
	blank: blankDemandCharge
};

export const RIDERS: TariffList<RiderInput> = {
	title: 'Riders',
	hint: 'A rider is an extra per-kWh amount on all usage, such as a fuel or program adjustment; a credit is negative.',
	path: 'riders',
	addLabel: 'Add a rider',
	blank: blankRider
};

export const TAXES: TariffList<TaxInput> = {
	title: 'Taxes',
	hint: 'A tax is a percentage of the bill before taxes; taxes do not compound on each other.',
	path: 'taxes',
	addLabel: 'Add a tax',
	blank: blankTax
};
