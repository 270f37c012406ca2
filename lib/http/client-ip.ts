// The client address for throttling. `next start` sets X-Forwarded-For to the socket address
// unless the request already carries one; behind a reverse proxy that appends (nginx
// $proxy_add_x_forwarded_for) the last entry is the address the proxy saw. Without a proxy a
// client can choose its own value, so the per-IP limit is a second line behind the per-account one.
export function clientIp(request: Request): string {
  const forwarded = request.headers.get("x-forwarded-for");
  const last = forwarded?.split(",").map((s) => s.trim()).filter(Boolean).pop();
  return last ?? request.headers.get("x-real-ip") ?? "unknown";
}
