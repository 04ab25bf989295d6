import NextAuth from "next-auth";
import { authOptions } from "@/lib/auth/options";

export const runtime = "nodejs";

type TContext = { params: Promise<{ nextauth: string[] }> };

async function handler(req: Request, ctx: TContext) {
  return NextAuth(req as never, ctx as never, authOptions());
}

export { handler as GET, handler as POST };
