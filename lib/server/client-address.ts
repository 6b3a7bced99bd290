import { env } from "./env";

/** The address every request gets when forwarded headers are not trusted (the app cannot see the socket behind Next). */
export const UNTRUSTED_ADDRESS = "direct";

/** How many proxies in front of the app add to X-Forwarded-For: 0 when TRUST_PROXY is unset or false. */
export function trustedHops(value: string | undefined): number {
  if (!value || value === "false") return 0;
  if (value === "true") return 1;
  return Math.min(20, Number(value) || 0);
}

const ADDRESS = /^[0-9a-f.:]{2,45}$/;

/**
 * The client's address for limits. X-Forwarded-For is believed only with TRUST_PROXY: each trusted
 * proxy appends the address it saw, so the client is the entry that many places from the right
 * (anything further left was written by the client and is ignored). Without TRUST_PROXY every
 * request counts as one address: Next answers behind its own server, and a client can put anything
 * in that header.
 */
export function clientAddress(headers: Headers, hops = trustedHops(env().TRUST_PROXY)): string {
  if (hops <= 0) return UNTRUSTED_ADDRESS;
  const entries = (headers.get("x-forwarded-for") ?? "").split(",").map((s) => s.trim().toLowerCase()).filter(Boolean);
  if (!entries.length) return UNTRUSTED_ADDRESS;
  const pick = entries[Math.max(0, entries.length - hops)]!.replace(/^\[|\](:\d+)?$/g, "");
  return ADDRESS.test(pick) ? pick : UNTRUSTED_ADDRESS;
}
