/**
 * The newest message to `to` in the local mail catcher, waiting for the job queue to send it (mail goes
 * out through the queue, which polls every second).
 */
export async function newestMailTo(
	to: string,
	timeoutMs = 15_000
): Promise<{ subject: string; text: string }> {
	const until = Date.now() + timeoutMs;
	for (;;) {
		const mails = (await (
			await fetch(`${process.env.MAIL_VIEW_URL}/messages?to=${encodeURIComponent(to)}`)
		).json()) as { subject: string; text: string }[];
		const newest = mails.at(-1);
		if (newest) return newest;
		if (Date.now() > until) throw new Error(`no mail to ${to} within ${timeoutMs} ms`);
		await new Promise((resolve) => setTimeout(resolve, 200));
	}
}
