// Calls route handlers directly, the way Next does: a Request plus { params: Promise }.
import { SESSION_COOKIE_NAME } from "@/lib/auth/session";

export const APP = "http://127.0.0.1:3210";
// Promise<never> fits every handler's params type (parameters are contravariant).
type Handler = (request: Request, context: { params: Promise<never> }) => Promise<Response>;

export type CallOptions = {
  body?: unknown;
  rawBody?: string;
  cookie?: string | null;
  params?: Record<string, string>;
  headers?: Record<string, string>;
  origin?: string | null;
  ip?: string;
};

export async function call(handler: Handler, method: string, path: string, o: CallOptions = {}): Promise<Response> {
  const headers: Record<string, string> = { host: "127.0.0.1:3210", "x-forwarded-for": o.ip ?? "198.51.100.7" };
  if (method !== "GET" && o.origin !== null) headers.origin = o.origin ?? APP;
  if (o.cookie) headers.cookie = o.cookie;
  let body: string | undefined;
  if (o.rawBody !== undefined) body = o.rawBody;
  else if (o.body !== undefined) {
    body = JSON.stringify(o.body);
    headers["content-type"] = "application/json";
  }
  Object.assign(headers, o.headers ?? {});
  const request = new Request(APP + path, { method, headers, body });
  return handler(request, { params: Promise.resolve(o.params ?? {}) as Promise<never> });
}

/** "joulebook_session=<id>" from a response's Set-Cookie, or null (also null for a blank cookie). */
export function sessionCookie(response: Response): string | null {
  for (const c of response.headers.getSetCookie()) {
    const [pair] = c.split(";");
    if (pair?.startsWith(`${SESSION_COOKIE_NAME}=`) && pair.length > SESSION_COOKIE_NAME.length + 1) return pair;
  }
  return null;
}

// Response bodies are checked field by field in the tests; `any` keeps those checks short.
export async function bodyOf(response: Response): Promise<any> {
  const text = await response.text();
  return text ? JSON.parse(text) : null;
}
