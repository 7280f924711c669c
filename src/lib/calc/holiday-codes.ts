import regions from './holiday-regions.json';

// The country and region codes date-holidays knows, copied into a small list (scripts/holiday-regions.mjs;
// a unit test keeps it equal to the package). Forms check codes in the browser with it, where the package
// itself, with every country's rules, would be 300 kB of JavaScript to download.
const known: Record<string, readonly string[] | undefined> = regions;

/** Whether date-holidays knows the country code (ISO 3166-1 alpha-2, upper case). */
export function isKnownCountry(country: string): boolean {
	return Object.hasOwn(known, country);
}

/** Whether date-holidays knows the region (state, province) code within the country. */
export function isKnownRegion(country: string, region: string): boolean {
	return isKnownCountry(country) && known[country]!.includes(region);
}
