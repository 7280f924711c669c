import { chromium } from '@playwright/test';
import { readFileSync } from 'node:fs';
const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox'] });
const W = +(process.env.W ?? 1366);
const ctx = await browser.newContext({ baseURL: 'http://127.0.0.1:55876', viewport: { width: W, height: 900 } });
const page = await ctx.newPage();
await page.goto('/signin'); await page.locator('body[data-hydrated]').waitFor({ state: 'attached' });
await page.locator('#pw-email').fill('owner@example.org');
await page.getByLabel('Password', { exact: true }).fill(JSON.parse(readFileSync('data/demo-people.json')).password);
await page.getByRole('button', { name: 'Sign in', exact: true }).click();
await page.getByRole('button', { name: 'Sign out' }).waitFor();
await page.goto('/sites/5e7e0000-0000-4000-8000-000000000001/scenarios/5c0e0000-0000-4000-8000-000000000101');
await page.locator('body[data-hydrated]').waitFor({ state: 'attached' });
await page.keyboard.press('Tab'); await page.keyboard.press('Enter');
for (let i = 0; i < 30; i++) {
  await page.keyboard.press('Tab');
  const d = await page.evaluate(() => { const e = document.activeElement; const r = e.getBoundingClientRect(); const s = getComputedStyle(e);
    return `${e.tagName} ${(e.getAttribute('aria-label')||e.textContent||e.id||'').trim().slice(0,40)} | x${Math.round(r.left)} y${Math.round(r.top+scrollY)} w${Math.round(r.width)} h${Math.round(r.height)} | ${s.outlineStyle} ${s.outlineWidth} ${s.outlineColor} off${s.outlineOffset}`; });
  console.log(i, d);
}
await page.screenshot({ path: '/tmp/e-dev/focus.png' });
await browser.close();
