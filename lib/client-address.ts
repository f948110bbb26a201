/**
 * Who is on the other end of a request. Forwarded-address headers are believed only when the
 * connection comes from a configured proxy (HEFTWISE_TRUSTED_PROXIES); otherwise they are removed
 * before Next.js sees the request, and Next.js fills X-Forwarded-For from the socket itself. So a
 * client cannot rotate its address to dodge the sign-in throttle, nor forge a victim's to lock
 * them out. Pure, apart from the header object it is given to clean.
 */
const FORWARDED = ["x-forwarded-for", "x-real-ip", "forwarded"];

const normalise = (address: string) => address.replace(/^::ffff:/, "");

/** Removes forwarded-address headers unless the socket is a trusted proxy. */
export function cleanForwardedHeaders(
  headers: Record<string, string | string[] | undefined>,
  socketAddress: string | undefined,
  trustedProxies: readonly string[],
): void {
  if (socketAddress && trustedProxies.includes(normalise(socketAddress))) return;
  for (const name of FORWARDED) delete headers[name];
}

/**
 * The client's address from X-Forwarded-For as the server left it: the right-most address that is
 * not a trusted proxy (with no proxies, the socket's own address, which Next.js put there).
 */
export function clientAddressFrom(
  forwardedFor: string | null | undefined,
  trustedProxies: readonly string[],
): string | null {
  if (!forwardedFor) return null;
  const chain = forwardedFor
    .split(",")
    .map((a) => normalise(a.trim()))
    .filter(Boolean);
  for (let i = chain.length - 1; i >= 0; i--) if (!trustedProxies.includes(chain[i])) return chain[i];
  return chain[0] ?? null;
}
