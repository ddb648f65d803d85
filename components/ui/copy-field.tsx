"use client";

import { useState } from "react";
import { Button } from "./button";

/** A read-only value shown once (a token, a private address) with a button that copies it. */
export function CopyField({ label, value }: { label: string; value: string }) {
  const [copied, setCopied] = useState(false);
  async function copy() {
    await navigator.clipboard?.writeText(value).then(
      () => setCopied(true),
      () => setCopied(false),
    );
  }
  return (
    <div className="flex flex-wrap gap-2">
      <input aria-label={label} readOnly value={value} className="input measure min-w-0 flex-1" onFocus={(e) => e.currentTarget.select()} />
      <Button type="button" variant="secondary" onClick={copy}>
        {copied ? "Copied" : "Copy"}
      </Button>
    </div>
  );
}
