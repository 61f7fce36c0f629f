import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { networkInterfaces } from 'node:os';
import path from 'node:path';
import { logger } from './logger';

const isIp = (host: string) => /^[\d.]+$/.test(host) || host.includes(':');

/** Every address a phone on the lab's network might use to reach this machine. */
function subjectAltNames(host: string): string {
  const ips = new Set(['127.0.0.1']);
  for (const list of Object.values(networkInterfaces()))
    for (const a of list ?? []) if (a.family === 'IPv4' && !a.internal) ips.add(a.address);
  const names = new Set(['localhost']);
  if (isIp(host) && host !== '0.0.0.0') ips.add(host);
  else if (!isIp(host)) names.add(host);
  return [...[...names].map((n) => `DNS:${n}`), ...[...ips].map((ip) => `IP:${ip}`)].join(',');
}

/**
 * The lab's own certificate, made once with openssl under TLS_DIR and kept: a phone that trusts
 * it once keeps trusting it. Delete the folder to make a new one (e.g. after the address changes).
 */
export function labCertificate(dir: string, host: string): { key: Buffer; cert: Buffer; certPath: string } {
  const keyPath = path.join(dir, 'key.pem');
  const certPath = path.join(dir, 'cert.pem');
  if (!existsSync(keyPath) || !existsSync(certPath)) {
    mkdirSync(dir, { recursive: true, mode: 0o700 });
    const san = subjectAltNames(host);
    execFileSync(
      'openssl',
      [
        'req',
        '-x509',
        '-newkey',
        'rsa:2048',
        '-nodes',
        '-sha256',
        '-days',
        '825',
        '-keyout',
        keyPath,
        '-out',
        certPath,
        '-subj',
        '/CN=Asepta lab server',
        '-addext',
        `subjectAltName=${san}`,
        '-addext',
        'basicConstraints=critical,CA:TRUE',
        '-addext',
        'keyUsage=critical,digitalSignature,keyEncipherment,keyCertSign',
        '-addext',
        'extendedKeyUsage=serverAuth',
      ],
      { stdio: 'ignore' },
    );
    logger.info({ certPath, san }, 'made a self-signed certificate for HTTPS');
  }
  return { key: readFileSync(keyPath), cert: readFileSync(certPath), certPath };
}
