import "server-only";
import { cache } from "react";
import { notFound, redirect } from "next/navigation";
import { cookies } from "next/headers";
import { type NextAuthOptions } from "next-auth";
import { getToken } from "next-auth/jwt";
import CredentialsProvider from "next-auth/providers/credentials";
import { z } from "zod";
import { can, type Permission, type Viewer } from "@/lib/domain/permissions";
import type { Role } from "@/lib/domain/roles";
import { isAppError } from "@/lib/errors";
import { clientAddress } from "./client-address";
import { env } from "./env";
import { authenticate, getActiveViewer } from "./data/users";

const CredentialsInput = z.object({
  email: z.string().trim().toLowerCase().email().max(254),
  password: z.string().min(1).max(200),
});

export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
  pages: { signIn: "/sign-in", error: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "Email and password",
      credentials: { email: { type: "email" }, password: { type: "password" } },
      async authorize(credentials, req) {
        const parsed = CredentialsInput.safeParse(credentials);
        if (!parsed.success) throw new Error("Enter your e-mail address and password.");
        try {
          const viewer = await authenticate({ ...parsed.data, address: clientAddress(req?.headers) });
          return { id: viewer.id, email: viewer.email, name: viewer.name, organizationId: viewer.organizationId, role: viewer.role };
        } catch (error) {
          // next-auth passes the message to the sign-in page; only expected errors carry a readable one.
          if (isAppError(error)) throw new Error(error.message);
          console.error("sign-in failed", error);
          throw new Error("Sign-in is unavailable right now. Try again shortly.");
        }
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        const u = user as typeof user & { organizationId: string; role: Role };
        token.userId = u.id;
        token.organizationId = u.organizationId;
        token.role = u.role;
      }
      return token;
    },
    async session({ session, token }) {
      return { ...session, userId: token.userId, organizationId: token.organizationId, role: token.role };
    },
  },
};

type TokenRequest = Parameters<typeof getToken>[0]["req"];

/**
 * The signed-in, still active user, or null. The database is asked each request so a deactivation or role change applies at once.
 * The session cookie is decoded directly (next-auth's own decoder, its cookie name and expiry checks): getServerSession would
 * also run the whole session route and encrypt a renewed cookie on every request, which a page or route handler here drops.
 */
export const getViewer = cache(async (): Promise<Viewer | null> => {
  const jar = await cookies();
  const token = await getToken({
    req: { cookies: Object.fromEntries(jar.getAll().map((c) => [c.name, c.value])), headers: {} } as unknown as TokenRequest,
    // The cookie's name (secure prefix or not) follows NEXTAUTH_URL as next-auth's own sign-in does.
    secret: env().NEXTAUTH_SECRET,
  });
  const userId = typeof token?.userId === "string" ? token.userId : null;
  if (!userId) return null;
  return getActiveViewer(userId);
});

/** For pages: the viewer, or a redirect to sign-in. */
export async function requireUser(): Promise<Viewer> {
  const viewer = await getViewer();
  if (!viewer) redirect("/sign-in");
  return viewer;
}

/** For pages: the viewer holding the permission; others see the not-found page. */
export async function requirePermission(permission: Permission): Promise<Viewer> {
  const viewer = await requireUser();
  if (!can(viewer, permission)) notFound();
  return viewer;
}
