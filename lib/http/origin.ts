// CSRF defence for route handlers: a state-changing request must come from our own origin.
// Browsers send Origin on every cross-site and same-site non-GET fetch and form post.
import { HttpError } from "./errors";

export class CrossOrigin extends HttpError {
  constructor() {
    super(403, "cross-origin request refused");
  }
}

function hostsWeAnswerTo(request: Request): Set<string> {
  const hosts = new Set<string>();
  const host = request.headers.get("host");
  if (host) hosts.add(host.toLowerCase());
  if (!host) hosts.add(new URL(request.url).host.toLowerCase());
  const appUrl = process.env.APP_URL;
  if (appUrl) {
    try {
      hosts.add(new URL(appUrl).host.toLowerCase());
    } catch {
      // A malformed APP_URL adds nothing; the Host header still applies.
    }
  }
  return hosts;
}

export function assertSameOrigin(request: Request): void {
  const origin = request.headers.get("origin");
  if (origin === null) {
    // No Origin: accept only when the browser itself says the request is same-origin or typed in.
    const site = request.headers.get("sec-fetch-site");
    if (site === "same-origin" || site === "none") return;
    throw new CrossOrigin();
  }
  let originHost: string;
  try {
    originHost = new URL(origin).host.toLowerCase();
  } catch {
    throw new CrossOrigin();
  }
  if (!hostsWeAnswerTo(request).has(originHost)) throw new CrossOrigin();
}
