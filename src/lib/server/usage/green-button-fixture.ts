/**
 * Invented Green Button (ESPI) files for tests, laid out the way the published espi.xsd orders
 * them: one entry per resource, one IntervalBlock entry per day, pretty-printed. No real utility,
 * meter or customer: the feed says so in a comment.
 */

export type FixtureOptions = {
	/** Unix seconds of the first reading. */
	start: number;
	readings: number;
	seconds: number;
	/** The `value` of reading `i`, in units of 10^multiplier Wh. */
	value: (i: number) => number;
	powerOfTenMultiplier?: number;
	uom?: number;
};

const HEAD = `<?xml version="1.0" encoding="UTF-8"?>
<!-- Invented data for Runrate's tests: no real utility, meter or customer. -->
<feed xmlns="http://www.w3.org/2005/Atom" xmlns:espi="http://naesb.org/espi">
	<id>urn:uuid:5d1c0e2a-0000-4000-8000-00000000f00d</id>
	<title>Invented Green Button download</title>
	<updated>2027-01-02T00:00:00Z</updated>`;

const base = 'https://greenbutton.example.org/espi/1_1/resource/RetailCustomer/1/UsagePoint/1';

function readingType(options: FixtureOptions) {
	return `
	<entry>
		<id>urn:uuid:5d1c0e2a-0000-4000-8000-0000000000a7</id>
		<link rel="self" href="https://greenbutton.example.org/espi/1_1/resource/ReadingType/1"/>
		<content>
			<espi:ReadingType>
				<espi:accumulationBehaviour>4</espi:accumulationBehaviour>
				<espi:commodity>1</espi:commodity>
				<espi:flowDirection>1</espi:flowDirection>
				<espi:intervalLength>${options.seconds}</espi:intervalLength>
				<espi:kind>12</espi:kind>
				<espi:phase>769</espi:phase>
				<espi:powerOfTenMultiplier>${options.powerOfTenMultiplier ?? 0}</espi:powerOfTenMultiplier>
				<espi:timeAttribute>0</espi:timeAttribute>
				<espi:uom>${options.uom ?? 72}</espi:uom>
			</espi:ReadingType>
		</content>
	</entry>`;
}

function reading(start: number, seconds: number, value: number) {
	return `
			<espi:IntervalReading>
				<espi:ReadingQuality><espi:quality>0</espi:quality></espi:ReadingQuality>
				<espi:timePeriod>
					<espi:duration>${seconds}</espi:duration>
					<espi:start>${start}</espi:start>
				</espi:timePeriod>
				<espi:value>${value}</espi:value>
			</espi:IntervalReading>`;
}

/** A whole invented download: usage point, meter reading, reading type and daily interval blocks. */
export function greenButtonXml(options: FixtureOptions): string {
	const perBlock = Math.max(1, Math.round(86_400 / options.seconds));
	const parts = [
		HEAD,
		`
	<entry>
		<link rel="self" href="${base}"/>
		<content>
			<espi:UsagePoint>
				<espi:ServiceCategory>
					<espi:kind>0</espi:kind>
				</espi:ServiceCategory>
			</espi:UsagePoint>
		</content>
	</entry>
	<entry>
		<link rel="self" href="${base}/MeterReading/1"/>
		<link rel="related" href="https://greenbutton.example.org/espi/1_1/resource/ReadingType/1"/>
		<content>
			<espi:MeterReading/>
		</content>
	</entry>`,
		readingType(options)
	];
	for (let first = 0; first < options.readings; first += perBlock) {
		const count = Math.min(perBlock, options.readings - first);
		const blockStart = options.start + first * options.seconds;
		parts.push(`
	<entry>
		<link rel="up" href="${base}/MeterReading/1/IntervalBlock"/>
		<content>
			<espi:IntervalBlock>
				<espi:interval>
					<espi:duration>${count * options.seconds}</espi:duration>
					<espi:start>${blockStart}</espi:start>
				</espi:interval>`);
		for (let i = first; i < first + count; i++)
			parts.push(reading(options.start + i * options.seconds, options.seconds, options.value(i)));
		parts.push(`
			</espi:IntervalBlock>
		</content>
	</entry>`);
	}
	parts.push('\n</feed>\n');
	return parts.join('');
}

/** About a year of 15-minute readings of one meter: roughly 10 MB of XML. */
export const yearOfQuarterHours = () =>
	greenButtonXml({
		start: Date.UTC(2026, 0, 1, 6) / 1000,
		readings: 365 * 96,
		seconds: 900,
		value: (i) => 200 + ((i * 37) % 150)
	});
