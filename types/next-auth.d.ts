import "next-auth";
import "next-auth/jwt";

declare module "next-auth" {
  interface Session {
    user?: { id: string; name?: string | null; email?: string | null; signedInAt?: number };
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    userId?: string;
    /** Milliseconds since the epoch when the user signed in with their password (kept as the session slides). */
    signedInAt?: number;
  }
}
