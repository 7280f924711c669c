/**
 * Sends a file to the bulk upload in parts of `partBytes` (the server takes no body over 11 MB), one
 * after another, telling `onSent` how many bytes are up. Each part is a slice of the File: the browser
 * reads it from disk as it sends, so a file of hundreds of MB is never held in the page either.
 */
export async function sendInParts(
	file: File,
	partBytes: number,
	maxMb: number,
	onSent: (bytes: number) => void
): Promise<{ uploadId: string; parts: number } | { error: string }> {
	if (file.size > maxMb * 1024 * 1024)
		return { error: `The file is over ${maxMb.toLocaleString('en-US')} MB.` };
	const uploadId = newUploadId();
	const parts = Math.ceil(file.size / partBytes);
	for (let part = 0; part < parts; part += 1) {
		const slice = file.slice(part * partBytes, (part + 1) * partBytes);
		let answer: Response;
		try {
			answer = await fetch(`/admin/urdb-import/uploads/${uploadId}/${part}`, {
				method: 'PUT',
				headers: { 'content-type': 'application/octet-stream' },
				body: slice
			});
		} catch {
			return { error: 'The upload broke off: check the connection and choose the file again.' };
		}
		if (!answer.ok) {
			const said = (await answer.json().catch(() => null)) as { message?: string } | null;
			return { error: said?.message ?? `The upload was refused (HTTP ${answer.status}).` };
		}
		onSent(Math.min((part + 1) * partBytes, file.size));
	}
	return { uploadId, parts };
}

/** A random version 4 UUID; crypto.randomUUID is missing outside secure contexts, getRandomValues is not. */
function newUploadId(): string {
	const bytes = crypto.getRandomValues(new Uint8Array(16));
	bytes[6] = (bytes[6]! & 0x0f) | 0x40;
	bytes[8] = (bytes[8]! & 0x3f) | 0x80;
	const hex = [...bytes].map((b) => b.toString(16).padStart(2, '0')).join('');
	return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
