"use client";

import { useEffect, useRef, useState } from "react";
import SignaturePad from "signature_pad";
import { Button } from "@/components/ui/button";
import type { SignatureMarkInput } from "@/lib/schemas/signature-request";

// A signature made by drawing on the screen (finger, pen or mouse) or by typing the name. The drawing is
// handed over as the pad's PNG; the server places it on the document's signature block.

function DrawPad({ label, onChange }: { label: string; onChange: (png: string | null) => void }) {
  const canvas = useRef<HTMLCanvasElement>(null);
  const pad = useRef<SignaturePad | null>(null);
  // The pad is made once: a new one (or a resized canvas) would wipe the drawing. It reports through the latest callback.
  const report = useRef(onChange);
  useEffect(() => {
    report.current = onChange;
  });
  useEffect(() => {
    const el = canvas.current!;
    // Sized in device pixels so the ink is sharp on phones; drawn in dark ink on a transparent background.
    const ratio = Math.max(window.devicePixelRatio || 1, 1);
    el.width = el.offsetWidth * ratio;
    el.height = el.offsetHeight * ratio;
    el.getContext("2d")!.scale(ratio, ratio);
    const p = new SignaturePad(el, { penColor: "#1f1c17", minWidth: 0.8, maxWidth: 2.6 });
    const done = () => report.current(p.isEmpty() ? null : p.toDataURL("image/png"));
    p.addEventListener("endStroke", done);
    pad.current = p;
    return () => {
      p.removeEventListener("endStroke", done);
      p.off();
    };
  }, []);
  return (
    <div className="space-y-2">
      <canvas
        ref={canvas}
        aria-label={label}
        data-testid="signature-canvas"
        className="h-40 w-full touch-none rounded border border-ink/40 bg-white"
      />
      <Button
        type="button"
        variant="secondary"
        onClick={() => {
          pad.current?.clear();
          report.current(null);
        }}
      >
        Clear
      </Button>
    </div>
  );
}

/** Draw or type: reports the signature as it stands (null while nothing is drawn or typed). */
export function SignatureInput({
  idPrefix,
  expectedName,
  onChange,
}: {
  idPrefix: string;
  expectedName: string;
  onChange: (mark: SignatureMarkInput | null) => void;
}) {
  const [mode, setMode] = useState<"drawn" | "typed">("drawn");
  const [typed, setTyped] = useState("");
  const [drawn, setDrawn] = useState<string | null>(null);
  const report = (m: typeof mode, png: string | null, name: string) =>
    onChange(m === "drawn" ? (png ? { kind: "drawn", png } : null) : name.trim() ? { kind: "typed", name } : null);
  const switchTo = (m: typeof mode) => {
    setMode(m);
    report(m, drawn, typed);
  };
  return (
    <div className="space-y-2">
      <div className="flex gap-2" role="radiogroup" aria-label="How to sign">
        {(["drawn", "typed"] as const).map((m) => (
          <label key={m} className="flex items-center gap-1 text-sm">
            <input type="radio" name={`${idPrefix}-mode`} checked={mode === m} onChange={() => switchTo(m)} />
            {m === "drawn" ? "Draw" : "Type my name"}
          </label>
        ))}
      </div>
      {mode === "drawn" ? (
        <DrawPad
          label={`Signature of ${expectedName}: draw here`}
          onChange={(png) => {
            setDrawn(png);
            report("drawn", png, typed);
          }}
        />
      ) : (
        <div className="space-y-1">
          <label className="label" htmlFor={`${idPrefix}-typed`}>
            Type your full name as your signature
          </label>
          <input
            id={`${idPrefix}-typed`}
            className="input"
            value={typed}
            placeholder={expectedName}
            autoComplete="name"
            onChange={(e) => {
              setTyped(e.target.value);
              report("typed", drawn, e.target.value);
            }}
          />
          {typed.trim() ? <p className="rounded border border-paper-edge bg-white px-3 py-2 text-2xl italic">{typed}</p> : null}
        </div>
      )}
    </div>
  );
}
