import { FITTING_K, type FittingKind, type FrictionMethod } from '$lib/calc';
import { figure } from '$lib/text/numbers';

/**
 * The pumping helper's pipe-friction choices as typed: the method, the Darcy–Weisbach inputs, and the
 * list of fittings, each row a kind and a count. Kept apart from pumping-panel.ts, which builds the
 * request from them.
 */

/** One fitting row of the form; `id` keys the row on the page and never leaves it. */
export interface FittingRow {
	id: number;
	kind: FittingKind;
	count: string;
}

/** The two methods, in the words the radio group shows. */
export const FRICTION_METHOD_LABELS: Record<FrictionMethod, string> = {
	'hazen-williams': 'Hazen–Williams (water near room temperature)',
	'darcy-weisbach': 'Darcy–Weisbach with the Colebrook friction factor (any water temperature)'
};

/** Each kind of fitting in plain words, in the order the select lists them. */
export const FITTING_NAMES: Record<FittingKind, string> = {
	'elbow-90-short': '90° elbow, standard',
	'elbow-90-medium': '90° elbow, medium bend',
	'elbow-90-long': '90° elbow, long sweep',
	'elbow-45': '45° elbow',
	'tee-run': 'Tee, water going straight through',
	'tee-branch': 'Tee, water turning into the branch',
	'ball-valve': 'Ball valve, open',
	'gate-valve': 'Gate valve, open',
	'globe-valve': 'Globe valve, open',
	'swing-check-valve': 'Swing check valve, open',
	'square-entrance': 'Pipe inlet, square-edged (water entering from a tank)',
	exit: 'Pipe outlet (water leaving into a tank or the air)'
};

/** The select's options: the plain name with the loss coefficient it stands for. */
export const FITTING_OPTIONS = (Object.keys(FITTING_NAMES) as FittingKind[]).map((kind) => ({
	value: kind,
	label: `${FITTING_NAMES[kind]} (K ${figure(FITTING_K[kind], 2)})`
}));

/** A new row: one standard elbow, the commonest fitting, with an id no other row of the list has. */
export function newFittingRow(rows: readonly FittingRow[]): FittingRow {
	const id = rows.reduce((max, row) => Math.max(max, row.id), 0) + 1;
	return { id, kind: 'elbow-90-short', count: '1' };
}
