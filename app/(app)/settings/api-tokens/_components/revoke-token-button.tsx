"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import type { revokeApiTokenAction } from "../actions";

export function RevokeTokenButton({
  apiTokenId,
  name,
  revokeToken,
}: {
  apiTokenId: string;
  name: string;
  revokeToken: typeof revokeApiTokenAction;
}) {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const [pending, startTransition] = useTransition();

  function revoke() {
    if (!window.confirm(`Revoke “${name}”? Integrations using it stop working at once.`)) return;
    setMessage(undefined);
    startTransition(async () => {
      const result = await revokeToken({ apiTokenId });
      if (!result.ok) setMessage(result.message);
      router.refresh();
    });
  }

  return (
    <>
      <Button variant="danger" disabled={pending} onClick={revoke}>
        {pending ? "Revoking…" : "Revoke"}
      </Button>
      {message ? (
        <p className="text-xs text-result-fail" role="alert">
          {message}
        </p>
      ) : null}
    </>
  );
}
