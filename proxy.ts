import { NextResponse, type NextRequest } from "next/server";

// Not an access check (that happens in every page, route handler and server
// action): it only tells pages which path was asked for, so that sign-in can
// return there afterwards.
export function proxy(request: NextRequest) {
  const headers = new Headers(request.headers);
  headers.set("x-tankwright-path", request.nextUrl.pathname + request.nextUrl.search);
  return NextResponse.next({ request: { headers } });
}

export const config = { matcher: ["/((?!api/|_next/|favicon.ico).*)"] };
