/** Number words for the comparison's tables: cents for money, whole kWh and kg, payback in years. */
export const cents = (amount: number, currency: string) =>
	new Intl.NumberFormat('en-US', {
		style: 'currency',
		currency,
		minimumFractionDigits: 2,
		maximumFractionDigits: 2
	}).format(amount);

export const signedCents = (amount: number, currency: string) =>
	Math.abs(amount) < 0.005 ? '—' : `${amount > 0 ? '+' : '−'}${cents(Math.abs(amount), currency)}`;

export const wholeNumber = (n: number) =>
	new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 }).format(n);

export const signedWhole = (n: number) =>
	Math.abs(n) < 0.5 ? '—' : `${n > 0 ? '+' : '−'}${wholeNumber(Math.abs(n))}`;

/** Simple payback in words: "never", "at once" when the scenario costs no more to buy, else years. */
export const paybackYears = (years: number | null) =>
	years === null
		? 'never'
		: years === 0
			? 'at once (no extra outlay)'
			: `${new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 }).format(years)} years`;

export const percent = (share: number) =>
	`${new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 }).format(share * 100)} %`;
