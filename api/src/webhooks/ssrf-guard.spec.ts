import { describe, expect, it } from '@jest/globals';
import { AllowList, checkWebhookUrl, isPublicAddress } from './ssrf-guard.js';

// Address ranges: RFC 1918 (private), RFC 1122 (loopback), RFC 3927 (link-local, where cloud
// metadata services answer at 169.254.169.254), RFC 4193 (IPv6 unique local), RFC 4291 (::1, fe80::/10).
describe('SSRF guard', () => {
  const none = new AllowList('');

  it.each(['127.0.0.1', '10.0.0.1', '172.16.5.4', '192.168.1.1', '169.254.169.254', '0.0.0.0', '100.64.0.1', '::1', 'fe80::1', 'fc00::1', '::ffff:127.0.0.1'])('refuses %s', (a) => {
    expect(isPublicAddress(a)).toBe(false);
  });

  it.each(['93.184.216.34', '8.8.8.8', '2001:4860:4860::8888'])('accepts the public address %s', (a) => {
    expect(isPublicAddress(a)).toBe(true);
  });

  it.each([
    ['http://127.0.0.1:9000/hook', /127\.0\.0\.1/],
    ['http://10.0.0.1/hook', /private/],
    ['http://169.254.169.254/latest/meta-data', /linkLocal/],
    ['http://[::1]:8080/', /loopback/],
    ['http://localhost:8080/', /loopback/],
    ['ftp://example.test/', /http or https/],
    ['https://user:pw@93.184.216.34/', /credentials/],
  ])('checkWebhookUrl(%s) explains the refusal', async (url, why) => {
    expect(await checkWebhookUrl(url, none)).toMatch(why);
  });

  it('lets the development allow-list through, and only what it names', async () => {
    const allow = new AllowList('127.0.0.1, localhost, 10.9.0.0/16');
    expect(await checkWebhookUrl('http://127.0.0.1:9000/hook', allow)).toBeNull();
    expect(await checkWebhookUrl('http://10.9.3.4/hook', allow)).toBeNull();
    expect(await checkWebhookUrl('http://10.0.0.1/hook', allow)).toMatch(/private/);
  });
});
