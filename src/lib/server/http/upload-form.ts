/**
 * The form data of an upload, or 'too-large' when SvelteKit stopped the body at BODY_SIZE_LIMIT (it
 * errors the body with status 413, before reading, when the declared length is over the limit). A
 * body within the limit is read whole, so the form's other fields come back with a refusal; the route
 * then checks the file's own size against its limit. `finishReadingBody` (hooks) reads and drops what
 * was not read, so the 413 reaches the client.
 */
export async function uploadForm(request: Request): Promise<FormData | 'too-large'> {
	try {
		return await request.formData();
	} catch (error) {
		if ((error as { status?: number }).status === 413) return 'too-large';
		throw error;
	}
}
