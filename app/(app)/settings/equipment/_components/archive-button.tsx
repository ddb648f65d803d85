"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import type { setEquipmentArchivedAction } from "../actions";

export function ArchiveButton({
  equipmentId,
  isArchived,
  name,
  setArchived,
}: {
  equipmentId: string;
  isArchived: boolean;
  name: string;
  setArchived: typeof setEquipmentArchivedAction;
}) {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const [pending, startTransition] = useTransition();

  function toggle() {
    setMessage(undefined);
    startTransition(async () => {
      const result = await setArchived({ equipmentId, isArchived: !isArchived });
      if (!result.ok) setMessage(result.message);
      router.refresh();
    });
  }

  return (
    <>
      <Button
        variant={isArchived ? "secondary" : "quiet"}
        disabled={pending}
        onClick={toggle}
        aria-label={`${isArchived ? "Restore" : "Archive"} ${name}`}
      >
        {isArchived ? "Restore" : "Archive"}
      </Button>
      {message ? (
        <span className="block text-xs text-result-fail" role="alert">
          {message}
        </span>
      ) : null}
    </>
  );
}
