import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';

/** The proxy configuration the README tells people to install. */
export const PROXY_CONF = resolve('deploy/nginx/runrate.conf');

/**
 * A whole nginx configuration around `include` (a file for nginx's `http` block, as Debian's
 * /etc/nginx/nginx.conf includes conf.d/*.conf): every path nginx writes sits in `work`, so it runs
 * as any user, from any folder, and leaves nothing behind. `accessLog` records which app process
 * answered each request.
 */
export function wrapperConf(work: string, include: string, accessLog?: string): string {
	return `pid ${work}/nginx.pid;
error_log ${work}/error.log warn;
worker_processes 1;
events { worker_connections 256; }
http {
    client_body_temp_path ${work}/client-body;
    proxy_temp_path ${work}/proxy;
    fastcgi_temp_path ${work}/fastcgi;
    uwsgi_temp_path ${work}/uwsgi;
    scgi_temp_path ${work}/scgi;
    log_format upstream '$upstream_addr';
    access_log ${accessLog ? `${accessLog} upstream` : 'off'};
    include ${include};
}
`;
}

/** The repo's configuration with the test's own ports: nginx on `listen`, the app processes on `apps`. */
export function withPorts(listen: number, apps: number[]): string {
	const conf = readFileSync(PROXY_CONF, 'utf8');
	const upstream = /(upstream runrate_app \{)[\s\S]*?(\n\s*keepalive)/;
	const rendered = conf
		.replace(upstream, `$1\n${apps.map((port) => `    server 127.0.0.1:${port};`).join('\n')}$2`)
		.replace(/\n(\s*)listen 80;/, `\n$1listen 127.0.0.1:${listen};`);
	if (!upstream.test(conf) || rendered.includes('listen 80;'))
		throw new Error(`${PROXY_CONF} no longer has the upstream block or the listen line this test replaces`);
	return rendered;
}
