import type { Role } from "@/db/schema";

declare module "next-auth" {
  interface User {
    role: Role;
    organisationId: string;
    /** How and from where this sign-in was made, kept on the server-side session record. */
    signedIn: { method: string; address: string | null; client: string | null };
  }
  interface Session {
    user: { id: string; role: Role; organisationId: string; name?: string | null; email?: string | null };
    sessionId: string;
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    userId: string;
    role: Role;
    organisationId: string;
    /** The server-side session record this token belongs to. */
    sessionId: string;
  }
}
