import { requireTariffWrite } from '$lib/server/guard';
import { tariffFormAction } from '$lib/server/tariffs/form-action';
import type { Actions, PageServerLoad } from './$types';

export const load = (async (event) => {
	const { tariff, versions } = await requireTariffWrite(event, event.params.tariffId);
	const latest = versions.at(-1)!;
	return {
		tariff: { id: tariff.id, name: tariff.name, utility: tariff.utility, revision: tariff.revision },
		meta: {
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
		},
		latest: {
			number: latest.number,
			effectiveFrom: latest.effectiveFrom,
			source: latest.source,
			structure: latest.structure
		}
	};
}) satisfies PageServerLoad;

export const actions = {
	default: (event) => tariffFormAction(event, { tariffId: event.params.tariffId })
} satisfies Actions;
