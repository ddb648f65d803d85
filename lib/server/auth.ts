import "server-only";
import { cache } from "react";
import { notFound, redirect } from "next/navigation";
import { getServerSession, type NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { z } from "zod";
import { can, type Permission, type Viewer } from "@/lib/domain/permissions";
import type { Role } from "@/lib/domain/roles";
import { isAppError } from "@/lib/errors";
import { clientAddress } from "./client-address";
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

/** The signed-in, still active user, or null. The database is asked each request so a deactivation or role change applies at once. */
export const getViewer = cache(async (): Promise<Viewer | null> => {
  const session = await getServerSession(authOptions);
  const userId = (session as { userId?: string } | null)?.userId;
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
