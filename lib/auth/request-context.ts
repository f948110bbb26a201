/** Where a request comes from — its address and its client — for the audit trail and the throttles. */
import { headers } from "next/headers";
import { clientAddressFrom } from "@/lib/client-address";
import { config } from "@/lib/config";

export interface RequestOrigin {
  address: string | null;
  client: string | null;
}

type HeaderSource = { get(name: string): string | null };

/** Pure: the address (lib/client-address.ts rules) and the User-Agent, cut to a sensible length. */
export function originOf(source: HeaderSource, trustedProxies: readonly string[]): RequestOrigin {
  return {
    address: clientAddressFrom(source.get("x-forwarded-for"), trustedProxies),
    client: source.get("user-agent")?.slice(0, 200) || null,
  };
}

/** The current request's origin (route handlers, server actions, pages). */
export async function requestOrigin(): Promise<RequestOrigin> {
  return originOf(await headers(), config().HEFTWISE_TRUSTED_PROXIES);
}
