import type { Metadata } from "next";
import { requirePermission } from "@/lib/server/auth";
import { listUsers } from "@/lib/server/data/users";
import { InviteUserForm } from "./_components/invite-user-form";
import { UserRow } from "./_components/user-row";
import { DataTable } from "@/components/ui/data-table";
import { changeRoleAction, inviteUserAction, renewInvitationAction, setActiveAction } from "./actions";

export const metadata: Metadata = { title: "Users" };

export default async function UsersPage() {
  const viewer = await requirePermission("users:manage");
  const users = await listUsers({ viewer });
  return (
    <div className="space-y-6">
      <h1>Users</h1>
      <section className="panel">
        <h2 className="mb-3">Invite someone</h2>
        <InviteUserForm invite={inviteUserAction} />
      </section>
      <DataTable columns={["Name", "E-mail", "Role", "Status", { label: "Actions", hidden: true }]}>
        {users.map((user) => (
          <UserRow
            key={user.id}
            user={user}
            isSelf={user.id === viewer.id}
            actions={{ changeRole: changeRoleAction, renewInvitation: renewInvitationAction, setActive: setActiveAction }}
          />
        ))}
      </DataTable>
    </div>
  );
}
