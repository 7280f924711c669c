// Writes src/lib/calc/holiday-regions.json: the country and region codes date-holidays knows, so the
// browser can check a holiday calendar's codes without downloading the package's 1.6 MB of rules.
// Run it after upgrading date-holidays; a unit test fails until the list matches the package again.
import Holidays from 'date-holidays';
import { writeFileSync } from 'node:fs';

function holidayRegions() {
	const all = new Holidays();
	return Object.fromEntries(
		Object.keys(all.getCountries())
			.sort()
			.map((country) => [country, Object.keys(all.getStates(country) ?? {}).sort()])
	);
}

writeFileSync('src/lib/calc/holiday-regions.json', JSON.stringify(holidayRegions(), null, '\t') + '\n');
