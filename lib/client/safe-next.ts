// Only same-site paths may be used as a return address after sign-in; anything else
// (absolute URLs, protocol-relative "//host", backslash tricks) falls back to "/".
export function safeNext(value: string | string[] | null | undefined): string {
  const candidate = Array.isArray(value) ? value[0] : value;
  if (!candidate || !candidate.startsWith("/") || candidate.startsWith("//") || candidate.includes("\\")) return "/";
  return candidate;
}

export function withNext(path: string, next: string): string {
  return next === "/" ? path : `${path}?next=${encodeURIComponent(next)}`;
}
