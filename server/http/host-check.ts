// Answers only requests addressed to a host name this server is meant to be reached at. A page on another
// site can point its own DNS name at 127.0.0.1 (DNS rebinding) and then read a local install's API as
// "same origin"; the Host header still carries the foreign name, so refusing unknown names defeats it.
import type { RequestHandler } from 'express';
import { badRequest } from './http-error';

const LOOPBACK_NAMES = ['localhost', '127.0.0.1', '[::1]'];
const WILDCARD_ADDRESSES = new Set(['0.0.0.0', '::', '[::]']);

function hostnameOf(hostHeader: string): string | null {
  try {
    return new URL(`http://${hostHeader}`).hostname.toLowerCase();
  } catch {
    return null;
  }
}

export interface HostNames {
  publicOrigin?: string;
  /** The address the server listens on; a specific one is a name it may be reached by. */
  listenHost?: string;
  allowedHosts?: readonly string[];
}

export function allowedHostNames({ publicOrigin, listenHost, allowedHosts = [] }: HostNames): Set<string> {
  const names = new Set(LOOPBACK_NAMES);
  if (publicOrigin) names.add(new URL(publicOrigin).hostname.toLowerCase());
  if (listenHost && !WILDCARD_ADDRESSES.has(listenHost))
    names.add(
      hostnameOf(listenHost.includes(':') && !listenHost.startsWith('[') ? `[${listenHost}]` : listenHost) ??
        listenHost,
    );
  for (const name of allowedHosts) names.add(hostnameOf(name) ?? name);
  return names;
}

export function refuseUnknownHosts(names: ReadonlySet<string>): RequestHandler {
  const list = [...names].join(', ');
  return (req, _res, next) => {
    const header = req.get('host');
    const name = header === undefined ? null : hostnameOf(header);
    if (name !== null && names.has(name)) return next();
    next(
      badRequest(
        `This server does not answer to the host name ${JSON.stringify(header ?? '')}; it answers to ${list}. Add a name with ALLOWED_HOSTS.`,
        [{ path: 'Host', message: 'is not an allowed host name' }],
      ),
    );
  };
}
