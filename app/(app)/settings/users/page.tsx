import type { Metadata } from "next";
import { requirePermission } from "@/lib/server/auth";
import { listUsers } from "@/lib/server/data/users";
import { InviteUserForm } from "./_components/invite-user-form";
import { UserRow } from "./_components/user-row";

export const metadata: Metadata = { title: "Users" };

export default async function UsersPage() {
  const viewer = await requirePermission("users:manage");
  const users = await listUsers({ viewer });
  return (
    <div className="space-y-6">
      <h1>Users</h1>
      <section className="panel">
        <h2 className="mb-3">Invite someone</h2>
        <InviteUserForm />
      </section>
      <div className="overflow-x-auto rounded-md border border-paper-edge bg-white/70">
        <table className="w-full text-left text-sm">
          <thead className="border-b border-paper-edge bg-paper-deep/70 text-xs uppercase tracking-wide text-ink-soft">
            <tr>
              <th className="px-3 py-2">Name</th>
              <th className="px-3 py-2">E-mail</th>
              <th className="px-3 py-2">Role</th>
              <th className="px-3 py-2">Status</th>
              <th className="px-3 py-2">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {users.map((user) => (
              <UserRow key={user.id} user={user} isSelf={user.id === viewer.id} />
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
