/**
 * Why a webhook send failed, in words an integrator can act on; the system's own code stays at the
 * end in parentheses for searching ("connect ECONNREFUSED 127.0.0.1:9" alone says little).
 */
export function plainSendError(e: Error & { code?: string }, url: URL): string {
  const where = url.port ? `${url.hostname}:${url.port}` : url.hostname;
  const code = e.code ?? (e.cause as { code?: string } | undefined)?.code;
  const tail = code ? ` (${code})` : '';
  switch (code) {
    case 'ECONNREFUSED':
      return `Nothing is listening at ${where}: the connection was refused. Is the receiver running, on that port?${tail}`;
    case 'ENOTFOUND':
    case 'EAI_AGAIN':
      return `The name ${url.hostname} could not be resolved: check the spelling of the host, or its DNS record.${tail}`;
    case 'ECONNRESET':
    case 'EPIPE':
      return `The receiver at ${where} closed the connection before answering.${tail}`;
    case 'ETIMEDOUT':
    case 'ENETUNREACH':
    case 'EHOSTUNREACH':
      return `The receiver at ${where} could not be reached over the network (a firewall, or the host is down).${tail}`;
    case 'CERT_HAS_EXPIRED':
      return `The receiver's TLS certificate has expired.${tail}`;
    case 'DEPTH_ZERO_SELF_SIGNED_CERT':
    case 'SELF_SIGNED_CERT_IN_CHAIN':
    case 'UNABLE_TO_VERIFY_LEAF_SIGNATURE':
    case 'ERR_TLS_CERT_ALTNAME_INVALID':
      return `The receiver's TLS certificate is not trusted for ${url.hostname} (self-signed, or issued for another name).${tail}`;
    default:
      return code ? `${e.message}` : e.message;
  }
}

/** The verdict of an HTTP answer that is not a 2xx, in words. */
export function plainStatus(statusCode: number): string {
  if (statusCode >= 300 && statusCode < 400) return `The receiver answered ${statusCode}, a redirect; webhooks do not follow redirects: use the final URL.`;
  if (statusCode === 401 || statusCode === 403) return `The receiver answered ${statusCode}: it refused the request (does it check the signature with this endpoint's secret?).`;
  if (statusCode === 404) return 'The receiver answered 404: nothing at that path (check the URL).';
  if (statusCode === 410) return 'The receiver answered 410 Gone: the endpoint is disabled until someone enables it again.';
  if (statusCode === 429) return 'The receiver answered 429: it asks for fewer requests; deliveries are retried later.';
  if (statusCode >= 500) return `The receiver answered ${statusCode}: an error on its side; deliveries are retried.`;
  return `The receiver answered ${statusCode}; only a 2xx counts as delivered.`;
}
