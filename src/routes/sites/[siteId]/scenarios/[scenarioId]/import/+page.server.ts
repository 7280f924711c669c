// A little over 60 lines: the import page's load and its one action, which reads the sheet or saves the mapped rows.
import { error, fail, redirect } from '@sveltejs/kit';
import { requireScenarioAccess } from '$lib/server/guard';
import { MAX_SHEET_BYTES, sheetKind } from '$lib/server/sheets/read-sheet';
import { listDevices } from '$lib/server/sites/equipment.service';
import { EQUIPMENT_COLUMNS } from '$lib/server/sites/equipment-sheet/columns';
import { importEquipmentSheet, mappingOf } from '$lib/server/sites/equipment-sheet/import';
import { MAX_EQUIPMENT_ROWS } from '$lib/server/sites/equipment-sheet/parse';
import { revisionOf } from '$lib/forms/storable';
import { uploadForm } from '$lib/server/http/upload-form';
import type { Actions, PageServerLoad, RequestEvent } from './$types';

const TOO_LARGE = `The file is over ${MAX_SHEET_BYTES / 1024 / 1024} MB.`;

async function editable(event: RequestEvent) {
	const access = await requireScenarioAccess(event, event.params.scenarioId, 'editor');
	if (access.scenario.siteId !== event.params.siteId) error(404, 'Not found');
	return access;
}

export const load = (async (event) => {
	const { scenario } = await editable(event);
	return {
		scenario: { id: scenario.id, name: scenario.name, revision: scenario.revision },
		deviceCount: (await listDevices(scenario.id)).length,
		columns: EQUIPMENT_COLUMNS.map(({ field, label, meaning }) => ({ field, label, meaning })),
		maxMb: MAX_SHEET_BYTES / 1024 / 1024,
		maxRows: MAX_EQUIPMENT_ROWS
	};
}) satisfies PageServerLoad;

/**
 * One action for both steps: "check" reads the sheet and shows the mapping, a preview and the row
 * errors; "import" does the same and, when the rows are good (or the person chose to leave out the
 * refused ones), saves the list in one transaction. Nothing is stored on a check or an error.
 */
export const actions = {
	default: async (event) => {
		const access = await editable(event);
		const form = await uploadForm(event.request);
		if (form === 'too-large')
			return fail(413, { mode: 'append', skipRefused: false, errors: { sheet: TOO_LARGE } });
		const choice = {
			intent: form.get('intent') === 'import' ? 'import' : 'check',
			mode: form.get('mode') === 'replace' ? 'replace' : 'append',
			skipRefused: form.get('skipRefused') === 'on',
			mapping: mappingOf(form),
			expectedRevision: revisionOf(form.get('expectedRevision'))
		} as const;
		const file = form.get('sheet');
		const values = { mode: choice.mode, skipRefused: choice.skipRefused };
		if (!(file instanceof File) || file.size === 0)
			return fail(400, { ...values, errors: { sheet: 'Choose a CSV or XLSX file.' } });
		if (file.size > MAX_SHEET_BYTES) return fail(413, { ...values, errors: { sheet: TOO_LARGE } });
		const kind = sheetKind(file.name);
		if (!kind) return fail(400, { ...values, errors: { sheet: 'The file must end in .csv or .xlsx.' } });
		const bytes = new Uint8Array(await file.arrayBuffer());
		const done = await importEquipmentSheet(access, bytes, kind, choice);
		if (done.status === 201)
			redirect(303, `/sites/${access.site.id}/scenarios/${access.scenario.id}?imported=${done.imported}`);
		return done.status === 200 ? done.answer : fail(done.status, done.answer);
	}
} satisfies Actions;
