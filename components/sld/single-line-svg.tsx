// The single-line diagram as inline SVG for the browser. No hooks and no
// client-only APIs, so server and client components can both render it.
import { createElement } from "react";
import { SLD_COLORS, shapeAttributes, type SldPrimitive, type SldScene } from "@/lib/sld";

// The app's font variables, with the face names as a fallback outside the app shell.
const TEXT_FONT = "var(--font-text, Inter), system-ui, sans-serif";
const MONO_FONT = "var(--font-measure, 'IBM Plex Mono'), ui-monospace, monospace";

function SvgPrimitive({ item }: { item: SldPrimitive }) {
  if (item.kind !== "text") return createElement(item.kind, shapeAttributes(item));
  return (
    <text
      x={item.x}
      y={item.y}
      fontSize={item.size}
      fontWeight={item.weight === "bold" ? 700 : 400}
      textAnchor={item.anchor}
      fill={SLD_COLORS[item.tone]}
      style={{ fontFamily: item.mono ? MONO_FONT : TEXT_FONT }}
    >
      {item.text}
    </text>
  );
}

/** Scales to its container's width; the scene's description is its accessible name. */
export function SingleLineSvg({ scene, className, label }: { scene: SldScene; className?: string; label?: string }) {
  return (
    <svg
      xmlns="http://www.w3.org/2000/svg"
      viewBox={`0 0 ${scene.width} ${scene.height}`}
      width="100%"
      role="img"
      aria-label={label ?? scene.description}
      className={className}
      style={{ height: "auto", display: "block", background: SLD_COLORS.white }}
    >
      {scene.items.map((item, i) => (
        <SvgPrimitive key={i} item={item} />
      ))}
    </svg>
  );
}
