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

const v4 = (b: number[]) => new ipaddr.IPv4(b);

/**
 * IPv6 forms that carry an IPv4 address, with where its four bytes sit: a stack or a gateway may
 * turn them into the IPv4 address, so `[::127.0.0.1]` or `[64:ff9b::a9fe:a9fe]` is only as public
 * as the address inside.
 */
function embeddedIPv4(a: ipaddr.IPv6): { form: string; inner: ipaddr.IPv4 } | null {
  const b = a.toByteArray();
  const zero = (from: number, to: number) => b.slice(from, to).every((x) => x === 0);
  if (zero(0, 10) && b[10] === 0xff && b[11] === 0xff) return { form: 'IPv4-mapped', inner: v4(b.slice(12)) };
  if (zero(0, 8) && b[8] === 0xff && b[9] === 0xff && zero(10, 12)) return { form: 'IPv4-translated', inner: v4(b.slice(12)) };
  // ::/96, IPv4-compatible (deprecated by RFC 4291); :: and ::1 are themselves
  if (zero(0, 12) && !(zero(12, 15) && b[15] <= 1)) return { form: 'IPv4-compatible', inner: v4(b.slice(12)) };
  if (a.match(ipaddr.IPv6.parse('64:ff9b::'), 96)) return { form: 'NAT64', inner: v4(b.slice(12)) };
  if (a.match(ipaddr.IPv6.parse('64:ff9b:1::'), 48)) return { form: 'NAT64 (local use)', inner: v4(b.slice(12)) };
  if (a.match(ipaddr.IPv6.parse('2002::'), 16)) return { form: '6to4', inner: v4(b.slice(2, 6)) };
  // Teredo: the client's address is the last 32 bits, inverted
  if (a.match(ipaddr.IPv6.parse('2001::'), 32)) return { form: 'Teredo', inner: v4(b.slice(12).map((x) => x ^ 0xff)) };
  return null;
}

/** The address's range as ipaddr.js names it; for an IPv6 form carrying an IPv4 address, the inner one's. */
export function addressRange(address: string): string {
  const addr = ipaddr.parse(address);
  if (addr.kind() === 'ipv4') return addr.range();
  const a = addr as ipaddr.IPv6;
  const embedded = embeddedIPv4(a);
  if (!embedded) return a.range();
  const inner = embedded.inner.range();
  if (embedded.form === 'IPv4-mapped') return inner;
  // a public address inside a translation or tunnel form: refused all the same (reach it directly)
  return inner === 'unicast' ? `${a.range() === 'unicast' ? 'ipv4Compatible' : a.range()}` : `${inner}, ${embedded.form}`;
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
