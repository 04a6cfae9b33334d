/**
 * nginx (Debian's /usr/sbin/nginx) as a reverse proxy on a free loopback port in front of API
 * instances, for the suites that break one of them, and (with `tls`) as the HTTPS and HTTP/2 front a
 * deployment puts before the app, for `bench:lighthouse`. Everything it writes (config, pid file, logs,
 * temp folders) lives in one temp folder, removed on stop().
 *
 * Retries are nginx's defaults made explicit: a request that could not reach an instance (refused,
 * reset before the request went out, timed out) goes to the next one, but a POST or PATCH that an
 * instance had already received is never sent again (no `non_idempotent`): it answers 502, as a
 * create must not be made twice behind the client's back. No upstream keep-alive: each request
 * opens its own connection, so none is lost to an instance closing an idle one at the same moment.
 */
import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import { request } from 'node:https';
import { chmodSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { freePort } from '../../server/db/free-port';
import { ensureSystemPackages } from '../../server/db/system-packages';
import { ApiClient } from './api-client';
import { groupAlive } from './api-instance';

const NGINX = '/usr/sbin/nginx';

/** Names the instance(s) nginx tried for an answer: "127.0.0.1:4301" or, after a retry, "…:4301, …:4302". */
export const UPSTREAM_HEADER = 'X-Upstream-Addr';

export interface LoadBalancerOptions {
  /**
   * Seconds an instance that failed stays out of rotation (nginx's fail_timeout, 10 by default).
   * After that nginx tries it again with the next request, and sends that request on to another
   * instance when it cannot connect.
   */
  failTimeoutSeconds?: number;
  /**
   * HTTPS with HTTP/2 towards the browser, as a deployment serves phones, with a self-signed
   * certificate for 127.0.0.1 made for the run (a browser must be told to accept it), and kept-alive
   * connections to the instances. `api` cannot be used then (fetch refuses the certificate).
   */
  tls?: boolean;
}

export interface LoadBalancer {
  /** http://127.0.0.1:port */
  url: string;
  port: number;
  api: ApiClient;
  /** The temp folder with nginx.conf and the logs. */
  dir: string;
  errorLog(): string;
  accessLog(): string;
  /** Stops nginx (master and workers) and removes the temp folder. */
  stop(): Promise<void>;
}

/** The generated nginx.conf: `upstreams` are the instances' loopback ports. */
export function nginxConfig(
  dir: string,
  port: number,
  upstreams: number[],
  options: LoadBalancerOptions = {},
) {
  const failTimeout = options.failTimeoutSeconds ?? 10;
  const servers = upstreams
    .map((upstream) => `    server 127.0.0.1:${upstream} max_fails=1 fail_timeout=${failTimeout}s;`)
    .join('\n');
  const listen = options.tls
    ? `listen 127.0.0.1:${port} ssl http2;
    ssl_certificate ${dir}/cert.pem;
    ssl_certificate_key ${dir}/key.pem;`
    : `listen 127.0.0.1:${port};`;
  // Kept-alive upstream connections only behind TLS: the fault suites want one connection per request.
  const keepAlive = options.tls ? '\n    keepalive 16;' : '';
  const reuse = options.tls ? '\n      proxy_set_header Connection "";' : '';
  return `daemon off;
worker_processes 1;
pid ${dir}/nginx.pid;
error_log ${dir}/error.log warn;
events { worker_connections 512; }
http {
  log_format upstreams '$remote_addr "$request" $status upstream=$upstream_addr/$upstream_status $request_time';
  access_log ${dir}/access.log upstreams;
  client_body_temp_path ${dir}/client-body;
  proxy_temp_path ${dir}/proxy;
  fastcgi_temp_path ${dir}/fastcgi;
  uwsgi_temp_path ${dir}/uwsgi;
  scgi_temp_path ${dir}/scgi;
  upstream conewise {
${servers}${keepAlive}
  }
  server {
    ${listen}
    client_max_body_size 2m;
    location / {
      proxy_pass http://conewise;
      proxy_http_version 1.1;${reuse}
      proxy_set_header Host $host;
      proxy_set_header X-Forwarded-For $proxy_add_x_forwarded_for;
      proxy_set_header X-Forwarded-Proto $scheme;
      proxy_next_upstream error timeout;
      proxy_connect_timeout 5s;
      add_header ${UPSTREAM_HEADER} $upstream_addr always;
    }
  }
}
`;
}

/** Starts nginx in front of the instances on `upstreams` and waits until /api/health answers 200 through it. */
export async function startLoadBalancer(
  upstreams: number[],
  options: LoadBalancerOptions = {},
): Promise<LoadBalancer> {
  ensureSystemPackages(['nginx']);
  const dir = mkdtempSync(join(tmpdir(), 'conewise-nginx-'));
  // Started as root, nginx runs its workers as nobody (its default user): they must pass through
  // this folder to reach their temp folders, which nginx creates and hands to them.
  chmodSync(dir, 0o711);
  const port = await freePort();
  const conf = join(dir, 'nginx.conf');
  if (options.tls) selfSignedCertificate(dir);
  writeFileSync(conf, nginxConfig(dir, port, upstreams, options));
  // -e: the error log from the first line on (before the config is read nginx would open
  // /var/log/nginx/error.log, which only root may write).
  const child = spawn(NGINX, ['-p', dir, '-c', conf, '-e', join(dir, 'error.log')], {
    stdio: ['ignore', 'pipe', 'pipe'],
    // Its own process group: stop() takes the master and its workers together.
    detached: true,
  });
  let output = '';
  child.stdout!.on('data', (chunk) => (output += chunk));
  child.stderr!.on('data', (chunk) => (output += chunk));
  const read = (name: string) => {
    try {
      return readFileSync(join(dir, name), 'utf8');
    } catch {
      return '';
    }
  };
  const url = `${options.tls ? 'https' : 'http'}://127.0.0.1:${port}`;
  const balancer: LoadBalancer = {
    url,
    port,
    api: new ApiClient(url),
    dir,
    errorLog: () => read('error.log'),
    accessLog: () => read('access.log'),
    stop: async () => {
      await stopGroup(child);
      rmSync(dir, { recursive: true, force: true });
    },
  };
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) {
      const log = balancer.errorLog();
      rmSync(dir, { recursive: true, force: true });
      throw new Error(`nginx exited (${child.exitCode}): ${output}\n${log}`);
    }
    const ok = options.tls
      ? await healthyOverTls(url)
      : await balancer.api.get('/api/health').then(
          (r) => r.status === 200,
          () => false,
        );
    if (ok) return balancer;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  const log = balancer.errorLog();
  await balancer.stop();
  throw new Error(`nginx did not answer through port ${port}: ${output}\n${log}`);
}

/** A certificate and key for 127.0.0.1 (openssl, one day), as cert.pem and key.pem in `dir`. */
function selfSignedCertificate(dir: string): void {
  ensureSystemPackages(['openssl']);
  execFileSync(
    'openssl',
    [
      'req',
      '-x509',
      '-newkey',
      'rsa:2048',
      '-nodes',
      '-days',
      '1',
      '-subj',
      '/CN=127.0.0.1',
      '-addext',
      'subjectAltName=IP:127.0.0.1',
      '-keyout',
      join(dir, 'key.pem'),
      '-out',
      join(dir, 'cert.pem'),
    ],
    { stdio: 'ignore' },
  );
}

/** Whether /api/health answers 200 through the TLS proxy at `url` (its own certificate accepted). */
function healthyOverTls(url: string): Promise<boolean> {
  return new Promise((resolve) => {
    const asked = request(`${url}/api/health`, { rejectUnauthorized: false }, (response) => {
      response.resume();
      resolve(response.statusCode === 200);
    });
    asked.on('error', () => resolve(false));
    asked.end();
  });
}

/** SIGTERM (nginx's fast shutdown) to the group, SIGKILL if it is still there after 10 s. */
async function stopGroup(child: ChildProcess): Promise<void> {
  const pgid = child.pid!;
  try {
    process.kill(-pgid, 'SIGTERM');
  } catch {
    return;
  }
  for (let waited = 0; waited < 10_000; waited += 100) {
    if (!groupAlive(pgid)) return;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  process.kill(-pgid, 'SIGKILL');
}
