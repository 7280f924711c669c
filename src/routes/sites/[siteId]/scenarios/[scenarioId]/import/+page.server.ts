import { error, fail, redirect } from '@sveltejs/kit';
import { requireScenarioAccess } from '$lib/server/guard';
import { MAX_SHEET_BYTES, sheetKind } from '$lib/server/sheets/read-sheet';
import { StaleWrite } from '$lib/server/sites/site.service';
import { listDevices, saveDevices } from '$lib/server/sites/equipment.service';
import { type ColumnMapping, EQUIPMENT_COLUMNS } from '$lib/server/sites/equipment-sheet/columns';
import {
	describeRowError,
	MAX_EQUIPMENT_ROWS,
	parseEquipmentSheet
} from '$lib/server/sites/equipment-sheet/parse';
import { revisionOf, unstorableIn } from '$lib/forms/storable';
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

/** The mapping the form sends (map.<field> = column index), or undefined before the person has seen one. */
function mappingOf(form: FormData): ColumnMapping | undefined {
	if (!form.has('map.name')) return undefined;
	return Object.fromEntries(
		EQUIPMENT_COLUMNS.map(({ field }) => {
			const raw = String(form.get(`map.${field}`) ?? '');
			return [field, /^\d+$/.test(raw) ? Number(raw) : null];
		})
	);
}

/**
 * One action for both steps: "check" reads the sheet and shows the mapping, a preview and the row
 * errors; "import" does the same and, when the rows are good (or the person chose to leave out the
 * refused ones), saves the list in one transaction. Nothing is stored on a check or an error.
 */
export const actions = {
	default: async (event) => {
		const { site, scenario, user } = await editable(event);
		const form = await uploadForm(event.request);
		if (form === 'too-large')
			return fail(413, { mode: 'append', skipRefused: false, errors: { sheet: TOO_LARGE } });
		const intent = form.get('intent') === 'import' ? 'import' : 'check';
		const mode = form.get('mode') === 'replace' ? 'replace' : 'append';
		const skipRefused = form.get('skipRefused') === 'on';
		const file = form.get('sheet');
		const values = { mode, skipRefused };
		if (!(file instanceof File) || file.size === 0)
			return fail(400, { ...values, errors: { sheet: 'Choose a CSV or XLSX file.' } });
		if (file.size > MAX_SHEET_BYTES) return fail(413, { ...values, errors: { sheet: TOO_LARGE } });
		const kind = sheetKind(file.name);
		if (!kind) return fail(400, { ...values, errors: { sheet: 'The file must end in .csv or .xlsx.' } });

		const existing = (await listDevices(scenario.id)).map((d) => d.spec);
		const sheet = await parseEquipmentSheet(new Uint8Array(await file.arrayBuffer()), kind, {
			mapping: mappingOf(form),
			takenNames: mode === 'append' ? existing.map((d) => d.name) : []
		});
		if ('error' in sheet) return fail(400, { ...values, errors: { sheet: sheet.error } });
		const report = {
			...values,
			header: sheet.header,
			mapping: sheet.mapping,
			preview: sheet.preview,
			rowCount: sheet.rowCount,
			accepted: sheet.devices.length,
			refused: sheet.errors.map((e) => ({ line: e.line, field: e.field, message: describeRowError(e) }))
		};
		// A spreadsheet cell can carry U+0000 (written _x0000_), which a device list cannot store.
		const unstorable = sheet.devices.find((d) => unstorableIn(d.spec));
		const found = unstorable && unstorableIn(unstorable.spec);
		if (unstorable && found)
			return fail(400, {
				...report,
				errors: { sheet: `Row ${unstorable.line}, ${found.path}: ${found.message}` }
			});
		if (intent === 'check') return report;
		if (sheet.devices.length === 0)
			return fail(400, { ...report, errors: { sheet: 'No row can be imported.' } });
		if (sheet.errors.length && !skipRefused) {
			return fail(400, {
				...report,
				errors: { sheet: 'Some rows were refused. Fix them, or choose to leave them out, and import again.' }
			});
		}
		const specs = sheet.devices.map((d) => d.spec);
		const list = mode === 'replace' ? specs : [...existing, ...specs];
		if (list.length > MAX_EQUIPMENT_ROWS) {
			return fail(400, {
				...report,
				errors: { sheet: `A scenario holds at most ${MAX_EQUIPMENT_ROWS} devices.` }
			});
		}
		try {
			await saveDevices(site, scenario, revisionOf(form.get('expectedRevision')), list, user);
		} catch (e) {
			if (!(e instanceof StaleWrite)) throw e;
			return fail(409, {
				...report,
				errors: {
					sheet:
						'Someone saved this scenario’s list while you were importing. Reload the page and import again.'
				}
			});
		}
		redirect(303, `/sites/${site.id}/scenarios/${scenario.id}?imported=${specs.length}`);
	}
} satisfies Actions;
