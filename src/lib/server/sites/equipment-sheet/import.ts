// Importing an equipment sheet into a scenario: read the sheet, report on its rows, merge with the stored
// list (append or replace) and save the list in one transaction.
import type { DeviceSpec } from '$lib/server/db/schema';
import { unstorableIn } from '$lib/forms/storable';
import type { SheetKind } from '$lib/server/sheets/read-sheet';
import type { Actor } from '$lib/server/workspaces/audit';
import { saveEquipment } from '../equipment-edits';
import { listDevices } from '../equipment.service';
import type { ScenarioRow } from '../scenario.service';
import type { SiteRow } from '../site.service';
import { type ColumnMapping, EQUIPMENT_COLUMNS } from './columns';
import { describeRowError, MAX_EQUIPMENT_ROWS, parseEquipmentSheet } from './parse';

/** What the person chose on the import form. */
export interface ImportChoice {
	/** `check` reads and reports; `import` also saves when the rows allow it. */
	intent: 'check' | 'import';
	/** `append` adds after the stored devices; `replace` stands in for them. */
	mode: 'append' | 'replace';
	/** Leave the refused rows out and import the rest. */
	skipRefused: boolean;
	mapping: ColumnMapping | undefined;
	expectedRevision: number;
}

/** The mapping the form sends (map.<field> = column index), or undefined before the person has seen one. */
export function mappingOf(form: FormData): ColumnMapping | undefined {
	if (!form.has('map.name')) return undefined;
	return Object.fromEntries(
		EQUIPMENT_COLUMNS.map(({ field }) => {
			const raw = String(form.get(`map.${field}`) ?? '');
			return [field, /^\d+$/.test(raw) ? Number(raw) : null];
		})
	);
}

/** The stored list with the sheet's devices added after it, or replaced by them. */
export const mergeDevices = (existing: DeviceSpec[], imported: DeviceSpec[], mode: ImportChoice['mode']) =>
	mode === 'replace' ? imported : [...existing, ...imported];

/**
 * Reads a sheet for a scenario and, when the choice is `import` and the rows are good (or the refused ones
 * are left out), saves the merged list against the revision the person edited. Nothing is stored on a
 * check or a refusal. The report (header, mapping, preview, counts, refused rows) goes back to the form.
 */
export async function importEquipmentSheet(
	{ site, scenario, user }: { site: SiteRow; scenario: ScenarioRow; user: Actor },
	bytes: Uint8Array,
	kind: SheetKind,
	choice: ImportChoice
) {
	const values = { mode: choice.mode, skipRefused: choice.skipRefused };
	const existing = (await listDevices(scenario.id)).map((d) => d.spec);
	const sheet = await parseEquipmentSheet(bytes, kind, {
		mapping: choice.mapping,
		takenNames: choice.mode === 'append' ? existing.map((d) => d.name) : []
	});
	if ('error' in sheet)
		return { status: 400, answer: { ...values, errors: { sheet: sheet.error } } } as const;
	const report = {
		...values,
		header: sheet.header,
		mapping: sheet.mapping,
		preview: sheet.preview,
		rowCount: sheet.rowCount,
		accepted: sheet.devices.length,
		refused: sheet.errors.map((e) => ({ line: e.line, field: e.field, message: describeRowError(e) }))
	};
	const refuse = (status: 400 | 409, message: string) =>
		({ status, answer: { ...report, errors: { sheet: message } } }) as const;
	// A spreadsheet cell can carry U+0000 (written _x0000_), which a device list cannot store.
	const unstorable = sheet.devices.find((d) => unstorableIn(d.spec));
	const found = unstorable && unstorableIn(unstorable.spec);
	if (unstorable && found) return refuse(400, `Row ${unstorable.line}, ${found.path}: ${found.message}`);
	if (choice.intent === 'check') return { status: 200, answer: report } as const;
	if (sheet.devices.length === 0) return refuse(400, 'No row can be imported.');
	if (sheet.errors.length && !choice.skipRefused)
		return refuse(400, 'Some rows were refused. Fix them, or choose to leave them out, and import again.');
	const specs = sheet.devices.map((d) => d.spec);
	const list = mergeDevices(existing, specs, choice.mode);
	if (list.length > MAX_EQUIPMENT_ROWS)
		return refuse(400, `A scenario holds at most ${MAX_EQUIPMENT_ROWS} devices.`);
	const saved = await saveEquipment({ site, scenario, user }, choice.expectedRevision, list);
	if (!saved.ok)
		return refuse(
			409,
			'Someone saved this scenario’s list while you were importing. Reload the page and import again.'
		);
	return { status: 201, imported: specs.length } as const;
}
