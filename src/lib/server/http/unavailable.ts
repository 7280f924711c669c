import type { RequestEvent } from '@sveltejs/kit';

const PAGE = `<!doctype html><html lang="en"><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Runrate is catching its breath</title>
<style>body{font:18px/1.5 system-ui,sans-serif;max-width:36rem;margin:4rem auto;padding:0 1.25rem;color:#13242b;background:#f6f8f7}
h1{font-size:1.5rem}</style>
<h1>Runrate cannot reach its database right now</h1>
<p>Nothing you saved is lost. The app reconnects by itself as soon as the database answers again.</p>
<p><a href="">Try again</a> in a few seconds.</p></html>`;

/** 503 with a readable page, or JSON for the API; Retry-After tells clients when to come back. */
export function unavailableResponse(event: RequestEvent): Response {
	const headers = { 'Retry-After': '5', 'Cache-Control': 'no-store' };
	if (event.url.pathname.startsWith('/api/'))
		return Response.json(
			{ error: 'database_unavailable', message: 'The database is not answering.' },
			{ status: 503, headers }
		);
	return new Response(PAGE, {
		status: 503,
		headers: { ...headers, 'Content-Type': 'text/html; charset=utf-8' }
	});
}
