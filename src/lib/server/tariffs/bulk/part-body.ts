import { PART_BYTES } from './bulk-upload';

/**
 * One part of a bulk upload from a PUT body, at most PART_BYTES, counted as it arrives whatever
 * Content-Length claims. Past the limit the rest is left for the hooks to read and drop, so the caller
 * gets the 413 rather than a reset connection.
 */
export async function readPartBody(request: Request): Promise<Uint8Array | 'too-large' | 'empty' | 'broken'> {
	if (Number(request.headers.get('content-length') ?? 0) > PART_BYTES) return 'too-large';
	const reader = request.body?.getReader();
	if (!reader) return 'empty';
	const chunks: Uint8Array[] = [];
	let size = 0;
	try {
		for (;;) {
			const { done, value } = await reader.read();
			if (done) break;
			size += value.byteLength;
			if (size > PART_BYTES) {
				reader.releaseLock();
				return 'too-large';
			}
			chunks.push(value);
		}
	} catch (error) {
		return (error as { status?: number }).status === 413 ? 'too-large' : 'broken';
	}
	return size === 0 ? 'empty' : new Uint8Array(Buffer.concat(chunks));
}
