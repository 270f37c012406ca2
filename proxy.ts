// Next 16 proxy (formerly middleware). No database here: it only passes the requested path on
// to server components, so that requireUser() can send people back after signing in.
import { NextResponse, type NextRequest } from "next/server";

export function proxy(request: NextRequest): NextResponse {
  const headers = new Headers(request.headers);
  headers.set("x-joulebook-path", request.nextUrl.pathname + request.nextUrl.search);
  return NextResponse.next({ request: { headers } });
}

export const config = {
  matcher: ["/((?!api/|_next/|favicon.ico|icon.svg).*)"],
};
