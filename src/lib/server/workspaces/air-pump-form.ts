// The air-pump page's form: one row a curve point, pressures in the unit the data sheet uses.
import { z } from 'zod';
import { type AirPump, airPumpSchema, PRESSURE_UNITS, type PressureUnit, pressureToKPa } from '$lib/calc';
import { fieldErrors, keepValues } from '$lib/forms/errors';

/** How many point rows the form offers: the schema's most. */
export const MAX_POINT_ROWS = 20;

const UNIT_WORDS: Record<PressureUnit, string> = { kPa: 'kPa', psi: 'psi', inH2O: 'inH₂O' };

/** A box's text as the schema should see it: nothing, a number, or the text itself ("must be a number"). */
function numberOrText(value: FormDataEntryValue | null): unknown {
	if (typeof value !== 'string' || value.trim() === '') return undefined;
	const n = Number(value.trim());
	return Number.isFinite(n) ? n : value;
}

const blank = (value: FormDataEntryValue | null) => typeof value !== 'string' || value.trim() === '';

export type PumpFormResult =
	| { ok: true; pump: AirPump; values: Record<string, string> }
	| { ok: false; errors: Record<string, string>; values: Record<string, string> };

/**
 * Reads the form into the core's pump: rows left wholly blank are skipped, pressures are converted to
 * kPa, and each message comes back under the box it is about (`pressure.3`, `airLpm.3`), in the unit
 * the person chose.
 */
export function readPumpForm(form: FormData): PumpFormResult {
	const values = keepValues(form);
	const unitParsed = z.enum(PRESSURE_UNITS).safeParse(form.get('pressureUnit'));
	if (!unitParsed.success)
		return { ok: false, values, errors: { pressureUnit: 'Pressure unit must be kPa, psi or inH₂O' } };
	const unit = unitParsed.data;
	const rows: number[] = [];
	const points: { pressureKPa: unknown; airLpm: unknown }[] = [];
	for (let row = 0; row < MAX_POINT_ROWS; row++) {
		const pressure = form.get(`pressure.${row}`);
		const air = form.get(`airLpm.${row}`);
		if (blank(pressure) && blank(air)) continue;
		const typed = numberOrText(pressure);
		rows.push(row);
		points.push({
			pressureKPa: typeof typed === 'number' ? pressureToKPa(typed, unit) : typed,
			airLpm: numberOrText(air)
		});
	}
	const parsed = airPumpSchema.safeParse({
		name: form.get('name') ?? undefined,
		points,
		inputWatts: blank(form.get('inputWatts')) ? null : numberOrText(form.get('inputWatts')),
		wireToAirPercent: numberOrText(form.get('wireToAirPercent'))
	});
	if (parsed.success) return { ok: true, pump: parsed.data, values };
	const errors: Record<string, string> = {};
	for (const [path, message] of Object.entries(fieldErrors(parsed.error))) {
		const [head, index, field] = path.split('.');
		if (head !== 'points' || index === undefined) {
			errors[path] ??= message;
			continue;
		}
		const row = rows[Number(index)];
		const key = field === 'airLpm' ? `airLpm.${row}` : `pressure.${row}`;
		errors[key] ??= field === 'pressureKPa' && /at most/.test(message) ? tooHigh(unit) : message;
	}
	return { ok: false, errors, values };
}

/** The schema's 300 kPa ceiling in the unit the person typed. */
function tooHigh(unit: PressureUnit) {
	const most = 300 / pressureToKPa(1, unit);
	return `Pressure must be at most ${most.toLocaleString('en-US', { maximumFractionDigits: 1 })} ${UNIT_WORDS[unit]}`;
}

/** A stored pump as the form's values, pressures in kPa. */
export function pumpFormValues(pump: AirPump): Record<string, string> {
	const values: Record<string, string> = {
		name: pump.name,
		pressureUnit: 'kPa',
		inputWatts: pump.inputWatts === null ? '' : String(pump.inputWatts),
		wireToAirPercent: String(pump.wireToAirPercent)
	};
	pump.points.forEach((point, i) => {
		values[`pressure.${i}`] = String(point.pressureKPa);
		values[`airLpm.${i}`] = String(point.airLpm);
	});
	return values;
}
