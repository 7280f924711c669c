// A stored tariff's fields as every page, export and API answer shows them.
import type { TariffRow } from './tariff.service';

/** A tariff's descriptive fields: the editor's meta, the export's `meta` and the detail page's heading. */
export const tariffMeta = (tariff: TariffRow) => ({
	utility: tariff.utility,
	name: tariff.name,
	code: tariff.code,
	country: tariff.country,
	region: tariff.region,
	area: tariff.area,
	customerClass: tariff.customerClass,
	currency: tariff.currency,
	timezone: tariff.timezone,
	holidays: tariff.holidays,
	description: tariff.description
});

/** The fields a library listing shows: the meta without the calendar (time zone, holidays) and description. */
export function tariffListing(tariff: TariffRow) {
	const { timezone: _t, holidays: _h, description: _d, ...listed } = tariffMeta(tariff);
	return listed;
}

/** Whose tariff it is: the public library, or one workspace's private tariff. */
export const tariffScope = (tariff: TariffRow) => ({
	scope: tariff.workspaceId ? ('private' as const) : ('public' as const),
	workspaceId: tariff.workspaceId
});
