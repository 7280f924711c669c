/** File downloads: a safe name from what the user called things, and the headers that go with it. */

/** "Alder Creek: hatchery!" + "Baseline" → "alder-creek-hatchery-baseline" (ASCII, at most 100 characters). */
export function safeFileName(...parts: string[]): string {
	const name = parts
		.join('-')
		.normalize('NFKD')
		.replace(/[\u0300-\u036f]/g, '')
		.toLowerCase()
		.replace(/[^a-z0-9]+/g, '-')
		.replace(/^-+|-+$/g, '')
		.slice(0, 100)
		.replace(/-+$/, '');
	return name || 'runrate-export';
}

export const CONTENT_TYPES = {
	csv: 'text/csv; charset=utf-8',
	json: 'application/json; charset=utf-8',
	xlsx: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet'
} as const;

/** A response that downloads `body` as `fileName.ext`, never cached by a shared cache. */
export function download(body: BodyInit, fileName: string, ext: keyof typeof CONTENT_TYPES): Response {
	return new Response(body, {
		headers: {
			'Content-Type': CONTENT_TYPES[ext],
			'Content-Disposition': `attachment; filename="${fileName}.${ext}"`,
			'Cache-Control': 'private, no-store'
		}
	});
}
