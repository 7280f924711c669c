import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { PROXY_CONF, wrapperConf } from './nginx';

// The reverse proxy's configuration in the repo is checked by Debian's nginx itself (`npm test`
// installs it when missing). `nginx -t` parses and checks the file without starting a server.
const work = mkdtempSync(join(tmpdir(), 'runrate-nginx-t-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

describe('deploy/nginx/runrate.conf', () => {
	it('passes nginx -t as it is in the repo', () => {
		const conf = join(work, 'nginx.conf');
		writeFileSync(conf, wrapperConf(work, PROXY_CONF));
		const check = spawnSync('nginx', ['-t', '-p', work, '-e', join(work, 'error.log'), '-c', conf], {
			encoding: 'utf8'
		});
		expect(check.stderr).toContain('test is successful');
		expect(check.status).toBe(0);
	});
});
