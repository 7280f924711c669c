// What "Which tariff is cheapest?" answers, browser-safe: the page, the printable report and the workbook.

/** What one stored version of a tariff says about itself: its number, dates and where its rates came from. */
export type VersionSource = {
	number: number;
	effectiveFrom: string;
	/** Null: still in force. */
	effectiveTo: string | null;
	/** Where the rates came from, as the tariff's author wrote it (a web address or a document). */
	source: string;
	/** When the author last checked the rates against the source, YYYY-MM-DD. */
	checkedOn: string;
};

/** Where a ranked or unpriced tariff's figures come from. */
export type TariffProvenance = {
	/** The open rate database's label of an imported rate; null for a tariff entered by hand. */
	urdbLabel: string | null;
	/** The versions priced (for a tariff not priced: its latest version). */
	versions: VersionSource[];
};

/** A tariff priced on the year: its annual cost and what it is made of. */
export type RankedTariff = {
	id: string;
	name: string;
	utility: string;
	current: boolean;
	annualCost: number;
	energyCost: number;
	fixedCost: number;
	demandCost: number;
	/** Annual cost minus the current tariff's; null when the current tariff was not priced. */
	differenceToCurrent: number | null;
	/** The numbers of the versions that priced the year, in the order used. */
	versionNumbers: number[];
	/** Each month's bill, in the order of `Ranking.usage`. */
	monthlyCosts: number[];
};

/** A tariff that was not priced, and why in words. */
export type UnpricedTariff = { id: string; name: string; utility: string; current: boolean; reason: string };

/** One month of the load priced: "2027-01", its kWh and its highest 15-minute demand in kW. */
export type UsageMonth = { month: string; kwh: number; peakKw: number };

/** A ranked or unpriced tariff with where its figures come from. */
export type WithProvenance<T> = T & { provenance: TariffProvenance };

/** A priced answer as the page, the report and the workbook show it. */
export type CheapestFigures = {
	/** Which months and which load: "January 2027 – December 2027, the estimated load of …". */
	priced: string;
	currency: string;
	/** Why the top tariff comes first, in sentences. */
	words: string[];
	ranked: WithProvenance<RankedTariff>[];
	unpriced: WithProvenance<UnpricedTariff>[];
	usage: UsageMonth[];
	/** How many tariffs the site may use in all, when more than were compared. */
	moreThanCompared: number | null;
};
