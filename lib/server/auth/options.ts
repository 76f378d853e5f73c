import "server-only";
import { sql } from "drizzle-orm";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { z } from "zod";
import { db, schema } from "@/db";
import { DUMMY_HASH, verifyPassword } from "./password";
import { clientIp, isSignInLimited, recordSignInFailure } from "./sign-in-limit";

const credentialsSchema = z.object({ email: z.string().trim().toLowerCase().email(), password: z.string().min(1).max(200) });

export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
  pages: { signIn: "/sign-in", error: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(raw, req) {
        const parsed = credentialsSchema.safeParse(raw);
        if (!parsed.success) return null;
        const { email, password } = parsed.data;
        const ip = clientIp(req.headers ?? {});
        if (await isSignInLimited(email, ip)) {
          await recordSignInFailure(email, ip, "rate_limited");
          throw new Error("RateLimited");
        }
        const [user] = await db.select().from(schema.users).where(sql`lower(${schema.users.email}) = ${email}`);
        const ok = await verifyPassword(password, user?.passwordHash ?? DUMMY_HASH);
        if (!user || !user.passwordHash || !ok) {
          await recordSignInFailure(email, ip, user ? "wrong_password" : "unknown_user");
          return null;
        }
        if (user.disabled) {
          await recordSignInFailure(email, ip, "disabled");
          throw new Error("AccountDisabled");
        }
        return { id: user.id, name: user.name, email: user.email, role: user.role, studioId: user.studioId, sessionVersion: user.sessionVersion };
      },
    }),
  ],
  callbacks: {
    jwt({ token, user }) {
      if (user) {
        token.uid = user.id;
        token.role = user.role;
        token.studioId = user.studioId;
        token.sv = user.sessionVersion;
      }
      return token;
    },
    session({ session, token }) {
      session.user = { ...session.user, id: token.uid, role: token.role, sessionVersion: token.sv };
      return session;
    },
  },
};
