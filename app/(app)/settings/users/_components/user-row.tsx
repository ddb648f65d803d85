"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { ROLES, ROLE_LABELS, type Role } from "@/lib/domain/roles";
import type { UserDto } from "@/lib/dto/users";
import type { changeRoleAction, renewInvitationAction, setActiveAction } from "../actions";

const STATUS_TEXT: Record<UserDto["status"], string> = {
  active: "Active",
  invited: "Invited, no password yet",
  deactivated: "Deactivated",
};

/** The page hands down what a row can do to its user. */
export type UserActions = {
  changeRole: typeof changeRoleAction;
  renewInvitation: typeof renewInvitationAction;
  setActive: typeof setActiveAction;
};

export function UserRow({ user, isSelf, actions }: { user: UserDto; isSelf: boolean; actions: UserActions }) {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const [pending, startTransition] = useTransition();

  function run(action: () => Promise<{ ok: boolean; message?: string }>, done?: string) {
    setMessage(undefined);
    startTransition(async () => {
      const result = await action();
      setMessage(result.ok ? done : result.message);
      router.refresh();
    });
  }

  return (
    <tr className="border-b border-paper-edge/70 last:border-0" data-testid={`user-${user.email}`}>
      <td className="px-3 py-2 font-medium">
        {user.name}
        {isSelf ? <span className="ml-2 text-xs text-ink-faint">(you)</span> : null}
      </td>
      <td className="measure px-3 py-2">{user.email}</td>
      <td className="px-3 py-2">
        <select
          aria-label={`Role of ${user.name}`}
          className="input py-1"
          defaultValue={user.role}
          disabled={isSelf || pending}
          onChange={(e) => run(() => actions.changeRole({ userId: user.id, role: e.target.value as Role }), "Role changed.")}
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </select>
      </td>
      <td className="px-3 py-2 text-ink-soft">
        {STATUS_TEXT[user.status]}
        {message ? (
          <p className="text-xs text-ink-faint" role="status">
            {message}
          </p>
        ) : null}
      </td>
      <td className="space-x-2 whitespace-nowrap px-3 py-2 text-right">
        {user.status === "invited" ? (
          <Button
            variant="quiet"
            disabled={pending}
            onClick={() => run(() => actions.renewInvitation({ userId: user.id }), "New link queued.")}
          >
            Send a new link
          </Button>
        ) : null}
        {isSelf ? null : user.status === "deactivated" ? (
          <Button variant="secondary" disabled={pending} onClick={() => run(() => actions.setActive({ userId: user.id, isActive: true }))}>
            Reactivate
          </Button>
        ) : (
          <Button variant="danger" disabled={pending} onClick={() => run(() => actions.setActive({ userId: user.id, isActive: false }))}>
            Deactivate
          </Button>
        )}
      </td>
    </tr>
  );
}
