/**
 * Where to go after sign-in: only a path on this site. `/\host`, `//host`, `https:`, control
 * characters and anything that resolves to another origin fall back to the overview.
 */
const BASE = "http://heftwise.invalid";

export function safeCallbackPath(value: string | undefined | null): string {
  if (!value || !value.startsWith("/") || /[\\\u0000-\u001f\u007f]/.test(value)) return "/";
  try {
    const url = new URL(value, BASE);
    if (url.origin !== BASE) return "/";
    return `${url.pathname}${url.search}${url.hash}`;
  } catch {
    return "/";
  }
}
