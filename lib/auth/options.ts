import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { clientAddressFrom } from "@/lib/client-address";
import { config } from "@/lib/config";
import { checkCredentials } from "./credentials";
import { closeSession, openSession, SESSION_MAX_AGE_S } from "./sessions";

/** The caller's address: X-Forwarded-For as the server left it (lib/client-address.ts). */
function clientAddress(headers: Record<string, unknown> | undefined): string | null {
  const forwarded = headers?.["x-forwarded-for"];
  return clientAddressFrom(typeof forwarded === "string" ? forwarded : null, config().HEFTWISE_TRUSTED_PROXIES);
}

export const authOptions: NextAuthOptions = {
  // Read when a request is handled, not when the build evaluates this module.
  get secret() {
    return config().secret;
  },
  session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_S },
  pages: { signIn: "/sign-in", signOut: "/sign-out", error: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: {
        email: { label: "E-mail", type: "email" },
        password: { label: "Password", type: "password" },
        code: { label: "Code", type: "text" },
      },
      async authorize(credentials, req) {
        // A thrown error's message reaches the sign-in form; it never says which part was wrong.
        const address = clientAddress(req?.headers);
        const { actor, method } = await checkCredentials(credentials, address);
        const agent = req?.headers?.["user-agent"];
        return {
          id: actor.id,
          name: actor.name,
          email: actor.email,
          role: actor.role,
          organisationId: actor.organisationId,
          signedIn: { method, address, client: typeof agent === "string" ? agent.slice(0, 200) : null },
        };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      // `user` is present only at sign-in: open the server-side session and copy the claims then.
      if (user) {
        token.userId = user.id;
        token.role = user.role;
        token.organisationId = user.organisationId;
        token.sessionId = await openSession(user.id, user.signedIn);
      }
      return token;
    },
    async session({ session, token }) {
      session.user = { ...session.user, id: token.userId, role: token.role, organisationId: token.organisationId };
      session.sessionId = token.sessionId;
      return session;
    },
  },
  events: {
    // Signing out ends the session on the server too: a copy of the token stops working.
    async signOut({ token }) {
      await closeSession(token?.sessionId);
    },
  },
};
