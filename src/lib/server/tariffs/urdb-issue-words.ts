// Where a problem of an open-rate-database rate sits, in words a person can find in the file.
import { MONTH_NAMES, type RequestIssue } from '$lib/calc';

const FIELDS: Record<string, string> = {
	energyratestructure: 'Energy rate structure',
	energyweekdayschedule: 'Weekday energy schedule',
	energyweekendschedule: 'Weekend energy schedule',
	demandratestructure: 'Demand rate structure',
	demandweekdayschedule: 'Weekday demand schedule',
	demandweekendschedule: 'Weekend demand schedule',
	flatdemandstructure: 'Flat demand structure',
	flatdemandmonths: 'Flat demand months',
	fixedmonthlycharge: 'Fixed monthly charge',
	fixedchargefirstmeter: 'Fixed charge',
	fixedchargeunits: 'Fixed charge units',
	minmonthlycharge: 'Minimum monthly charge',
	annualmincharge: 'Annual minimum charge',
	startdate: 'Start date',
	enddate: 'End date',
	label: 'Label',
	name: 'Rate name',
	utility: 'Utility',
	sector: 'Sector',
	source: 'Source',
	uri: 'Address (uri)'
};

const clock = (hour: number) => `${String(hour).padStart(2, '0')}:00`;

/** The place a dotted path names: "Weekday energy schedule, April, 05:00–06:00"; "" for the rate itself. */
export function placeInWords(path: string): string {
	const parts = path.split('.').filter((part) => part !== '');
	// The database API's answer wraps the rate: items.0.<field>.
	const [field, ...rest] = parts[0] === 'items' ? parts.slice(2) : parts;
	if (field === undefined) return '';
	const name = FIELDS[field] ?? `"${field}"`;
	const at = rest.map(Number).filter(Number.isInteger);
	if (field.endsWith('schedule')) {
		const [month, hour] = at;
		const words = [name];
		if (month !== undefined) words.push(MONTH_NAMES[month] ?? `month ${month + 1}`);
		if (hour !== undefined) words.push(`${clock(hour)}–${clock(hour + 1)}`);
		return words.join(', ');
	}
	if (field.endsWith('structure')) {
		const [period, tier] = at;
		const words = [name];
		if (period !== undefined) words.push(`period ${period + 1}`);
		if (tier !== undefined) words.push(`tier ${tier + 1}`);
		return words.join(', ');
	}
	return name;
}

/** A problem as one sentence that says where it is; zod's generic type messages become plain words. */
export function issueInWords(issue: RequestIssue): string {
	const place = placeInWords(issue.path);
	const message = /^Invalid input/.test(issue.message) ? 'has a value of the wrong kind' : issue.message;
	if (!place) return /^has /.test(message) ? `The rate ${message}` : message;
	return /^has /.test(message) ? `${place} ${message}` : `${place}: ${message}`;
}
