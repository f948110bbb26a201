import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { config } from "@/lib/config";
import { checkCredentials } from "./credentials";

function clientAddress(headers: Record<string, unknown> | undefined): string | null {
  const forwarded = headers?.["x-forwarded-for"];
  if (typeof forwarded === "string" && forwarded) return forwarded.split(",")[0].trim();
  const real = headers?.["x-real-ip"];
  return typeof real === "string" && real ? real : null;
}

export const authOptions: NextAuthOptions = {
  // Read when a request is handled, not when the build evaluates this module.
  get secret() {
    return config().secret;
  },
  session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
  pages: { signIn: "/sign-in", signOut: "/sign-out", error: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(credentials, req) {
        // A thrown error's message reaches the sign-in form; it never says which part was wrong.
        const actor = await checkCredentials(credentials, clientAddress(req?.headers));
        return { id: actor.id, name: actor.name, email: actor.email, role: actor.role, organisationId: actor.organisationId };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      // `user` is present only at sign-in: copy the claims into the token then.
      if (user) {
        token.userId = user.id;
        token.role = user.role;
        token.organisationId = user.organisationId;
      }
      return token;
    },
    async session({ session, token }) {
      session.user = { ...session.user, id: token.userId, role: token.role, organisationId: token.organisationId };
      return session;
    },
  },
};
