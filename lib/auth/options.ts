import "server-only";
import type { NextAuthOptions } from "next-auth";
import Credentials from "next-auth/providers/credentials";
import { z } from "zod";
import { serverEnv } from "@/lib/env";
import { checkCredentials } from "./sign-in";

const ZCredentials = z.object({ email: z.string().trim().min(3).max(320), password: z.string().min(1).max(500) });

export function authOptions(): NextAuthOptions {
  return {
    secret: serverEnv().AUTH_SECRET,
    session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
    pages: { signIn: "/sign-in", error: "/sign-in" },
    providers: [
      Credentials({
        name: "E-mail and password",
        credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
        async authorize(raw) {
          const parsed = ZCredentials.safeParse(raw);
          if (!parsed.success) return null;
          return checkCredentials(parsed.data.email, parsed.data.password);
        },
      }),
    ],
    callbacks: {
      jwt({ token, user }) {
        if (user) {
          token.userId = user.id;
          token.signedInAt = Date.now();
        }
        return token;
      },
      session({ session, token }) {
        // Roles are not carried in the token: they are read from the database on every request.
        if (session.user && token.userId) {
          session.user.id = token.userId;
          session.user.signedInAt = token.signedInAt;
        }
        return session;
      },
    },
  };
}
