import { newDevice, nextMonth, type QuickDevice } from './quick-estimate';

/*
 * The quick estimate in the address bar, so a link shares it and a reload, Back or sign-up keeps it.
 *
 *   /?month=2027-01&kwh=0.15&fixed=10&d=1_1Ax120V_always_Water+pump&d=2_200W_12h_Grow+light
 *
 * One `d` a device: how many, its power (`200W`, or `1Ax120V` from the nameplate), when it runs
 * (`always`, or hours a day such as `12h`) and its name last, so the name may hold any character.
 * The rate is a flat price (`kwh`, `fixed` a month) or a library tariff (`tariff`, its id).
 * A number the person left empty or half typed travels as an empty slot and comes back empty, so the
 * field shows its message again instead of a made-up value.
 */

/** Everything the person typed into the quick estimate. */
export type QuickEntries = {
	month: string;
	devices: QuickDevice[];
	rateMode: 'flat' | 'library';
	perKwh: number | null;
	perMonth: number | null;
	tariffId: string;
};

/** At most this many devices on the home page (and in a link to it). */
export const MAX_QUICK_DEVICES = 8;
const MAX_NAME_LENGTH = 100;
const MONTH = /^\d{4}-(0[1-9]|1[0-2])$/;
const TARIFF_ID = /^[0-9a-f-]{36}$/i;

/** What a new visitor sees: one water pump at 0.15 per kWh, next month. */
export const defaultEntries = (now = new Date()): QuickEntries => ({
	month: nextMonth(now),
	devices: [newDevice()],
	rateMode: 'flat',
	perKwh: 0.15,
	perMonth: 0,
	tariffId: ''
});

/** A number as the address writes it: empty when the field is empty or not a number. */
const numberText = (n: number | null | undefined) =>
	typeof n === 'number' && Number.isFinite(n) ? String(n) : '';

/** A number from the address; null (an empty field) when the slot is empty or not a number. */
function numberFrom(text: string | undefined): number | null {
	if (text === undefined || text.trim() === '') return null;
	const n = Number(text);
	return Number.isFinite(n) ? n : null;
}

function deviceText(d: QuickDevice): string {
	const power =
		d.powerMode === 'watts' ? `${numberText(d.watts)}W` : `${numberText(d.amps)}Ax${numberText(d.volts)}V`;
	const runs = d.runMode === 'always' ? 'always' : `${numberText(d.hoursPerDay)}h`;
	return [numberText(d.quantity), power, runs, d.name].join('_');
}

function deviceFrom(text: string): QuickDevice {
	const [quantity, power = '', runs = '', ...name] = text.split('_');
	const device = newDevice();
	device.name = name.join('_').slice(0, MAX_NAME_LENGTH);
	device.quantity = numberFrom(quantity) as number;
	const amps = /^(.*)Ax(.*)V$/.exec(power);
	const watts = /^(.*)W$/.exec(power);
	if (amps)
		Object.assign(device, { powerMode: 'amps', amps: numberFrom(amps[1]), volts: numberFrom(amps[2]) });
	else if (watts) Object.assign(device, { powerMode: 'watts', watts: numberFrom(watts[1]) });
	const hours = /^(.*)h$/.exec(runs);
	if (hours) Object.assign(device, { runMode: 'hours', hoursPerDay: numberFrom(hours[1]) });
	return device;
}

/** The entries as a query string (without the "?"). */
export function entriesToQuery(entries: QuickEntries): string {
	const q = new URLSearchParams({ month: entries.month });
	if (entries.rateMode === 'library') q.set('tariff', entries.tariffId);
	else {
		q.set('kwh', numberText(entries.perKwh));
		q.set('fixed', numberText(entries.perMonth));
	}
	for (const d of entries.devices) q.append('d', deviceText(d));
	return q.toString();
}

/**
 * The entries a query string holds; what it lacks or garbles falls back to the defaults (a month that
 * is not one, a tariff id that is not one), and devices past the eighth are dropped.
 */
export function entriesFromQuery(query: URLSearchParams, now = new Date()): QuickEntries {
	const entries = defaultEntries(now);
	const month = query.get('month') ?? '';
	if (MONTH.test(month)) entries.month = month;
	const devices = query.getAll('d').slice(0, MAX_QUICK_DEVICES);
	if (devices.length) entries.devices = devices.map(deviceFrom);
	const tariffId = query.get('tariff') ?? '';
	if (TARIFF_ID.test(tariffId)) Object.assign(entries, { rateMode: 'library', tariffId });
	else if (query.has('kwh')) {
		entries.perKwh = numberFrom(query.get('kwh') ?? '');
		entries.perMonth = numberFrom(query.get('fixed') ?? '') ?? 0;
	}
	return entries;
}

/** Whether a query string carries an estimate at all (a device, or a rate), rather than a bare home page. */
export const carriesEstimate = (query: URLSearchParams) =>
	query.has('d') || query.has('kwh') || query.has('tariff');
