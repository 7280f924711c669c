import { error, fail } from '@sveltejs/kit';
import { requireScenarioAccess } from '$lib/server/guard';
import { listDevices } from '$lib/server/sites/equipment.service';
import { deliveryInputs } from '$lib/server/sites/delivery';
import { readDetailsForm, searchedDetails } from '$lib/server/sites/scenario-details-form';
import { saveScenarioDetails } from '$lib/server/sites/scenario-details';
import { chooserFor, TARIFF_UNAVAILABLE, usableTariff } from '$lib/server/tariffs/usable';
import { tariffChoices } from '$lib/server/tariffs/tariff-choices';
import { needsElectricalCaution } from '$lib/cautions';
import { listAirPumps } from '$lib/server/workspaces/air-pumps';
import { airDesignFormAction } from '$lib/server/sites/air-design-form';
import type { Actions, PageServerLoad } from './$types';

/** The scenario's own tariff in words for everyone who may read the page; null: the site's tariff. */
async function ownTariffName(workspaceId: string, tariffId: string | null): Promise<string | null> {
	if (!tariffId) return null;
	const found = await usableTariff(workspaceId, tariffId);
	return found ? `${found.tariff.utility} — ${found.tariff.name}` : TARIFF_UNAVAILABLE;
}

/** The scenario's tariff choices: the scenario's and the site's tariffs always among them. */
const scenarioTariffChoices = (
	access: Parameters<typeof chooserFor>[0] & { scenario: { tariffId: string | null } },
	url: URL
) =>
	tariffChoices(chooserFor(access, access.scenario), {
		search: url.searchParams.get('tariffs') ?? '',
		current: [access.scenario.tariffId, access.site.tariffId]
	});

export const load = (async (event) => {
	const access = await requireScenarioAccess(event, event.params.scenarioId, 'viewer');
	const { scenario, role, site } = access;
	if (scenario.siteId !== event.params.siteId) error(404, 'Not found');
	const devices = await listDevices(scenario.id);
	const specs = devices.map((d) => d.spec);
	const canEdit = role !== 'viewer';
	return {
		scenario: {
			id: scenario.id,
			name: scenario.name,
			description: scenario.description,
			isBaseline: scenario.isBaseline,
			status: scenario.status,
			oneOffCosts: scenario.oneOffCosts,
			tariffId: scenario.tariffId,
			tariffName: await ownTariffName(site.workspaceId, scenario.tariffId),
			revision: scenario.revision
		},
		// Only those who may choose see the choices: a guest, only public ones and those already chosen.
		tariffs: canEdit ? await scenarioTariffChoices(access, event.url) : null,
		searched: canEdit ? searchedDetails(event.url, scenario) : null,
		devices: specs,
		caution: needsElectricalCaution(specs),
		// The stored air design and the site's water: the page works out the delivery of the list as edited.
		delivery: deliveryInputs(scenario.airDesign, site.water),
		canEdit,
		// The air designer: the saved design, the site's water, the workspace's pumps (members only).
		airDesign: scenario.airDesign ?? null,
		water: site.water,
		airPumps: access.viaGrant ? [] : await listAirPumps(site.workspaceId)
	};
}) satisfies PageServerLoad;

export const actions = {
	/** Name, description, installed or proposed, one-off costs and tariff, against the page's revision. */
	details: async (event) => {
		const access = await requireScenarioAccess(event, event.params.scenarioId, 'editor');
		if (access.scenario.siteId !== event.params.siteId) error(404, 'Not found');
		const read = readDetailsForm(await event.request.formData(), access.scenario);
		if (!read.ok) return fail(400, { errors: read.errors, values: read.values });
		const saved = await saveScenarioDetails(access, read.details, read.revision, '');
		if ('conflict' in saved)
			return fail(409, {
				errors: {
					form: 'Someone else saved this scenario while you were editing. What you typed is still here and not saved: copy what you need, reload to see their change, then make yours again.'
				},
				values: read.values
			});
		if ('issues' in saved)
			return fail(400, {
				errors: Object.fromEntries(saved.issues.map((i) => [i.path, i.message])),
				values: read.values
			});
		if ('missing' in saved) error(404, 'Not found');
		return { saved: true, revision: saved.revision };
	},
	/** "Add to scenario" of the air designer: the design, and its pumps into the list, against the revision. */
	airDesign: async (event) => {
		const access = await requireScenarioAccess(event, event.params.scenarioId, 'editor');
		if (access.scenario.siteId !== event.params.siteId) error(404, 'Not found');
		return airDesignFormAction(access, await event.request.formData());
	}
} satisfies Actions;
