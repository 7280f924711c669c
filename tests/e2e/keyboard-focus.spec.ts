import { expect, test, type Page } from '@playwright/test';
import { SCENARIO, SITE } from './access-routes';
import { gotoReady, signInWithPassword } from './helpers';

// The scenario editor by keyboard alone: Tab reaches every control in the order the eye reads them, and
// the control that has focus always shows it with a ring a person can see (the app's one :focus-visible
// style: 2 px of reed-700, at least 7.6:1 on every light ground; white on the dark header).

const REED_700 = 'rgb(27, 81, 64)';
/** More stops than the demo scenario's editor has up to "Add a device": a missing control fails. */
const MAX_STOPS = 80;

type Stop = { name: string; left: number; top: number; right: number; bottom: number };

/** The focused element, described, with its box in page coordinates. */
async function focused(page: Page): Promise<Stop> {
	return page.evaluate(() => {
		const el = document.activeElement as HTMLElement;
		const box = el.getBoundingClientRect();
		const name = el.getAttribute('aria-label') || el.textContent?.trim().slice(0, 40) || el.id;
		return {
			name: `${el.tagName.toLowerCase()} "${name}"`,
			left: box.left + scrollX,
			top: box.top + scrollY,
			right: box.right + scrollX,
			bottom: box.bottom + scrollY
		};
	});
}

/** The focused control is on screen and wears the focus ring (after its colour transition ends). */
async function expectVisibleFocus(page: Page, stop: Stop) {
	const current = page.locator(':focus');
	await expect(current, `${stop.name} is visible`).toBeVisible();
	await expect(current, `${stop.name} is scrolled into view`).toBeInViewport();
	await expect
		.poll(
			() =>
				current.evaluate((el) => {
					const style = getComputedStyle(el);
					const ring =
						style.outlineStyle !== 'none' && parseFloat(style.outlineWidth) >= 2
							? style.outlineColor
							: 'none';
					return style.boxShadow !== 'none' && ring === 'none' ? 'shadow' : ring;
				}),
			{ message: `${stop.name} shows a 2 px focus ring` }
		)
		.toBe(REED_700);
}

/**
 * Reading order: focus never goes back up the page to the left of where it was (a new grid column to
 * the right may start higher, as in a table row), and on one line it moves rightwards.
 */
function expectReadingOrder(stops: Stop[]) {
	for (let i = 1; i < stops.length; i++) {
		const [a, b] = [stops[i - 1]!, stops[i]!];
		const sameLine = b.top < a.bottom && a.top < b.bottom;
		const step = `${a.name} → ${b.name}`;
		if (sameLine) expect(b.left, `${step} moves rightwards on one line`).toBeGreaterThan(a.left);
		else if (b.top < a.top)
			expect(b.left, `${step} goes up only into a column to the right`).toBeGreaterThanOrEqual(a.right);
	}
}

/** Tabs `count` times, or until a stop's name matches `until`, checking each stop on the way. */
async function tabThrough(page: Page, count: number, until?: RegExp): Promise<Stop[]> {
	const stops: Stop[] = [];
	for (let i = 0; i < count; i++) {
		await page.keyboard.press('Tab');
		const stop = await focused(page);
		await expectVisibleFocus(page, stop);
		stops.push(stop);
		if (until?.test(stop.name)) break;
	}
	return stops;
}

for (const size of [
	{ name: 'desk', width: 1366, height: 900 },
	{ name: 'phone', width: 390, height: 844 }
]) {
	test(`the scenario editor by keyboard at ${size.name} width: visual order and a visible focus ring`, async ({
		page
	}) => {
		await page.setViewportSize(size);
		await signInWithPassword(page, 'editor@example.org');
		await gotoReady(page, `/sites/${SITE}/scenarios/${SCENARIO}`);

		// The first Tab reaches the skip link, which is visible with focus and takes focus to the content.
		await page.keyboard.press('Tab');
		await expect(page.getByRole('link', { name: 'Skip to content' })).toBeFocused();
		await expectVisibleFocus(page, await focused(page));
		await page.keyboard.press('Enter');

		// From the back link through every device row's controls to "Add a device" and the helper below.
		const stops = await tabThrough(page, MAX_STOPS, /Add a device/);
		expect(stops[0]!.name).toContain('←');
		expect(stops.at(-1)!.name).toContain('Add a device');
		expect(stops.filter((s) => s.name.includes('Details of')).length).toBeGreaterThanOrEqual(2);
		stops.push(...(await tabThrough(page, 1)));
		expect(stops.at(-1)!.name).toContain('Pumping and aeration helper');
		expectReadingOrder(stops);

		// The first device's details: chips, month buttons and the rest, in order, each with the ring.
		const details = page.getByRole('button', { name: /^Details of / }).first();
		await details.focus();
		await page.keyboard.press('Enter');
		await expect(details).toHaveAttribute('aria-expanded', 'true');
		expectReadingOrder(await tabThrough(page, 16));
	});
}
