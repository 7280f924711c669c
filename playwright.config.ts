import { defineConfig } from '@playwright/test';

// Driven by scripts/test.mjs, which starts PostgreSQL and the stand-ins and passes their addresses.
const port = Number(process.env.APP_PORT ?? 4173);
const baseURL = `http://127.0.0.1:${port}`;

export default defineConfig({
	testDir: 'tests/e2e',
	// The ready times of README's "The browser's share" are measured on demand (PAGE_TIMES=1), never
	// asserted: otherwise that file is not collected at all, rather than counted as a skipped test.
	testMatch: process.env.PAGE_TIMES ? ['**/*.spec.ts', '**/page-times.measure.ts'] : '**/*.spec.ts',
	fullyParallel: false,
	workers: 1,
	retries: 0,
	// Generous bounds for a busy machine: under `npm run e2e:loaded` with five other builds running
	// (load average about 30 on 2 cores) multi-step tests took up to 32 s. A test still waits on what
	// the page promises, so a quiet machine is no slower for these.
	timeout: 90_000,
	expect: { timeout: 20_000 },
	reporter: [['list'], ['json']],
	use: {
		baseURL,
		browserName: 'chromium',
		headless: true,
		trace: 'off',
		// Debian's Chromium: Playwright never downloads a browser on this machine.
		launchOptions: {
			executablePath: '/usr/bin/chromium',
			args: [
				'--no-sandbox',
				'--disable-gpu',
				'--disable-background-networking',
				'--disable-component-update',
				'--disable-sync',
				'--no-first-run',
				'--disable-quic'
			]
		}
	},
	webServer: {
		command: `node ${process.env.RUNRATE_BUILD_DIR || 'build'}`,
		url: `${baseURL}/health`,
		reuseExistingServer: false,
		timeout: 60_000,
		env: {
			HOST: '127.0.0.1',
			PORT: String(port),
			ORIGIN: baseURL,
			DATABASE_URL: process.env.DATABASE_URL ?? '',
			AUTH_SECRET: process.env.AUTH_SECRET ?? '',
			SMTP_URL: process.env.SMTP_URL ?? '',
			MAIL_VIEW_URL: process.env.MAIL_VIEW_URL ?? '',
			S3_ENDPOINT: process.env.S3_ENDPOINT ?? '',
			S3_BUCKET: process.env.S3_BUCKET ?? '',
			S3_ACCESS_KEY_ID: process.env.S3_ACCESS_KEY_ID ?? '',
			S3_SECRET_ACCESS_KEY: process.env.S3_SECRET_ACCESS_KEY ?? '',
			LOG_LEVEL: 'warn',
			// Uploads go up to 10 MB; the JSON API enforces its own 1 MB limit.
			BODY_SIZE_LIMIT: '11M'
		}
	}
});
