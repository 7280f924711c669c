// Importing a tariff sheet into a workspace (or the public library): check every row, then create every
// tariff in one transaction, or none.
import type { SheetKind } from '$lib/server/sheets/read-sheet';
import { unstorableIn } from '$lib/forms/storable';
import { describeRowError, parseTariffSheet } from './sheet-import';
import { importTariffs } from './tariff.service';

/**
 * Reads a tariff sheet and, unless `dryRun`, imports its good rows into `workspaceId` (null: the public
 * library). A sheet-level problem, or a cell PostgreSQL cannot store, imports nothing. Answers the rows
 * accepted (on a check) or imported (with their new ids), and the refused rows.
 */
export async function importTariffSheet(
	bytes: Uint8Array,
	kind: SheetKind,
	into: { workspaceId: string | null; dryRun: boolean; author: Parameters<typeof importTariffs>[2] }
) {
	const result = await parseTariffSheet(bytes, kind);
	const refused = result.errors.map((e) => ({
		line: e.line,
		field: e.field,
		message: describeRowError(e)
	}));
	if (result.sheetErrors.length) return { ok: false, sheetErrors: result.sheetErrors, refused } as const;
	// A spreadsheet cell can carry U+0000 (written _x0000_), which a rider or tax label cannot store.
	const unstorable = result.rows.find((r) => unstorableIn(r.structure));
	if (unstorable) {
		const sheetErrors = [`Row ${unstorable.line}: ${unstorableIn(unstorable.structure)?.message}`];
		return { ok: false, sheetErrors, refused } as const;
	}
	const summary = result.rows.map((r) => ({
		line: r.line,
		name: r.meta.name,
		utility: r.meta.utility,
		effectiveFrom: r.version.effectiveFrom
	}));
	if (into.dryRun || result.rows.length === 0)
		return { ok: true, checked: true, accepted: summary, refused, imported: [] } as const;
	const ids = await importTariffs(result.rows, into.workspaceId, into.author);
	const imported = summary.map((s, i) => ({ ...s, id: ids[i]! }));
	return { ok: true, checked: false, accepted: [], refused, imported } as const;
}
