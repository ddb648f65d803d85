"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { STAGES, STAGE_LABELS, stageIndex, type Stage } from "@/lib/domain/stages";
import type { changeStageAction } from "../../actions";

export function StageChangeForm({
  projectId,
  current,
  changeStage,
}: {
  projectId: string;
  current: Stage;
  changeStage: typeof changeStageAction;
}) {
  const router = useRouter();
  const next = STAGES[Math.min(stageIndex(current) + 1, STAGES.length - 1)];
  const [toStage, setToStage] = useState<Stage>(next === current ? STAGES[0] : next);
  const [note, setNote] = useState("");
  const [message, setMessage] = useState<string>();
  const [pending, startTransition] = useTransition();

  function submit(event: React.FormEvent) {
    event.preventDefault();
    setMessage(undefined);
    startTransition(async () => {
      const result = await changeStage({ projectId, toStage, note });
      if (!result.ok) {
        setMessage(result.fieldErrors?.note?.[0] ?? result.message);
        return;
      }
      setNote("");
      router.refresh();
    });
  }

  return (
    <form onSubmit={submit} className="space-y-2 rounded border border-paper-edge bg-paper/60 p-3">
      <FormMessage kind="error">{message}</FormMessage>
      <label className="label" htmlFor="to-stage">
        Move to stage
      </label>
      <select id="to-stage" className="input" value={toStage} onChange={(e) => setToStage(e.target.value as Stage)}>
        {STAGES.filter((s) => s !== current).map((s) => (
          <option key={s} value={s}>
            {STAGE_LABELS[s]}
            {stageIndex(s) < stageIndex(current) ? " (back)" : ""}
          </option>
        ))}
      </select>
      <label className="label" htmlFor="stage-note">
        Note
      </label>
      <textarea
        id="stage-note"
        className="input"
        rows={2}
        maxLength={2000}
        value={note}
        onChange={(e) => setNote(e.target.value)}
        placeholder="What happened, e.g. permit number received"
      />
      <Button type="submit" disabled={pending} className="w-full">
        {pending ? "Saving…" : "Change stage"}
      </Button>
    </form>
  );
}
