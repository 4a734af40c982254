import ipaddr from 'ipaddr.js';
import dns from 'node:dns';
import net from 'node:net';

/**
 * Webhook URLs point wherever an integrator says, so the API must not be turned into a probe of
 * its own network: the host is resolved and every address must be a public unicast one, unless the
 * development allow-list (WEBHOOK_ALLOWED_HOSTS) names it. The check runs in the socket's lookup,
 * so the address checked is the address connected to (no DNS rebinding in between).
 */
export class SsrfError extends Error {
  constructor(readonly host: string, readonly address: string, readonly range: string) {
    super(`${host} resolves to ${address} (${range}), which webhooks may not reach`);
  }
}

export function addressRange(address: string): string {
  let addr = ipaddr.parse(address);
  if (addr.kind() === 'ipv6' && (addr as ipaddr.IPv6).isIPv4MappedAddress()) addr = (addr as ipaddr.IPv6).toIPv4Address();
  return addr.range();
}

/** `unicast` is the only range ipaddr.js gives public addresses; everything else is refused. */
export function isPublicAddress(address: string): boolean {
  return addressRange(address) === 'unicast';
}

export class AllowList {
  private readonly hosts = new Set<string>();
  private readonly cidrs: Array<[ipaddr.IPv4 | ipaddr.IPv6, number]> = [];

  constructor(spec: string) {
    for (const raw of spec.split(',').map((s) => s.trim().toLowerCase()).filter(Boolean)) {
      if (raw.includes('/')) this.cidrs.push(ipaddr.parseCIDR(raw));
      else this.hosts.add(raw.replace(/^\[|\]$/g, ''));
    }
  }

  allows(host: string, address?: string): boolean {
    const h = host.toLowerCase().replace(/^\[|\]$/g, '');
    if (this.hosts.has(h) || (address && this.hosts.has(address))) return true;
    if (!address) return false;
    const a = ipaddr.parse(address);
    return this.cidrs.some(([net, bits]) => a.kind() === net.kind() && a.match(net, bits));
  }
}

/** Checks a URL before it is stored: scheme, and the addresses its host has right now. */
export async function checkWebhookUrl(raw: string, allow: AllowList): Promise<string | null> {
  let url: URL;
  try {
    url = new URL(raw);
  } catch {
    return 'is not a valid URL';
  }
  if (url.protocol !== 'https:' && url.protocol !== 'http:') return 'must be an http or https URL';
  if (url.username || url.password) return 'must not carry credentials';
  const host = url.hostname.replace(/^\[|\]$/g, '');
  if (allow.allows(host)) return null;
  let addresses: string[];
  if (net.isIP(host)) addresses = [host];
  else {
    try {
      addresses = (await dns.promises.lookup(host, { all: true, verbatim: true })).map((a) => a.address);
    } catch {
      return `host ${host} does not resolve`;
    }
  }
  for (const a of addresses) {
    if (!isPublicAddress(a) && !allow.allows(host, a)) return `resolves to ${a} (${addressRange(a)}), a private, loopback, link-local or reserved address`;
  }
  return null;
}

/** A `lookup` for http.request that refuses non-public addresses outside the allow-list. */
export function guardedLookup(allow: AllowList): net.LookupFunction {
  return (hostname, options, callback) => {
    dns.lookup(hostname, { ...(options as dns.LookupOptions), all: true, verbatim: true }, (err, addresses) => {
      if (err) return (callback as (e: Error | null, a: dns.LookupAddress[]) => void)(err, []);
      const list = addresses as dns.LookupAddress[];
      for (const a of list) {
        if (!isPublicAddress(a.address) && !allow.allows(hostname, a.address)) {
          return (callback as (e: Error | null, a: dns.LookupAddress[]) => void)(new SsrfError(hostname, a.address, addressRange(a.address)), []);
        }
      }
      if ((options as dns.LookupOptions).all) return (callback as (e: Error | null, a: dns.LookupAddress[]) => void)(null, list);
      return (callback as (e: Error | null, a: string, f: number) => void)(null, list[0].address, list[0].family);
    });
  };
}
