import { chromium } from '@playwright/test';
const base = 'http://127.0.0.1:3000';
const pages = process.argv.slice(2);
const browser = await chromium.launch({ executablePath: '/usr/bin/chromium' });
for (const [w, h, tag] of [[1366, 900, 'desk'], [390, 844, 'phone']]) {
	const ctx = await browser.newContext({ viewport: { width: w, height: h } });
	const page = await ctx.newPage();
	await page.goto(base + '/signin');
	await page.waitForSelector('body[data-hydrated]');
	await page.locator('#pw-email').fill('owner@example.org');
	await page.getByLabel('Password', { exact: true }).fill('runrate-demo-2027');
	await page.getByRole('button', { name: 'Sign in', exact: true }).click();
	await page.getByRole('button', { name: 'Sign out', includeHidden: true }).first().waitFor({ state: 'attached' });
	for (const p of pages) {
		const [name, path] = p.split('=');
		await page.goto(base + path);
		await page.waitForSelector('body[data-hydrated]');
		await page.waitForTimeout(800);
		const sw = await page.evaluate(() => document.documentElement.scrollWidth);
		await page.screenshot({ path: `/work/shots18/${name}-${tag}.png`, fullPage: true });
		console.log(name, tag, 'scrollWidth', sw);
	}
	await ctx.close();
}
await browser.close();
