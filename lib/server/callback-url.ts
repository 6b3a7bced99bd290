/** Only same-site paths are accepted as a place to return to after sign-in. */
export function safeCallback(raw: string | string[] | undefined, fallback = "/plans"): string {
  const v = Array.isArray(raw) ? raw[0] : raw;
  return v && v.startsWith("/") && !v.startsWith("//") ? v : fallback;
}
