// The single-line diagram drawn as PDF vectors with @react-pdf's SVG primitives, from the same
// scene the browser shows, painted and scaled beforehand (lib/documents/single-line.ts).
import { Circle, G, Line, Path, Rect, Svg, Text } from "@react-pdf/renderer";
import { createElement, type ElementType } from "react";
import type { PaintedItem, PaintedScene, PaintedShape } from "@/lib/documents/single-line";
import { MEASURE_FONT, TEXT_FONT } from "./fonts";

export interface PdfDiagramFonts {
  text: string;
  mono: string;
}

const SHAPES: Record<PaintedShape["kind"], ElementType> = { line: Line, rect: Rect, circle: Circle, path: Path };

function PdfPrimitive({ item, fonts }: { item: PaintedItem; fonts: PdfDiagramFonts }) {
  if (item.kind !== "text") return createElement(SHAPES[item.kind], item.attributes);
  const font = { fontFamily: item.mono ? fonts.mono : fonts.text, fontSize: item.size, fontWeight: item.bold ? 700 : 400 };
  // react-pdf loads a family only when it meets it in a style, so the face is named there as well.
  return (
    <Text x={item.x} y={item.y} textAnchor={item.anchor} fill={item.fill} {...font} style={font as never}>
      {item.text}
    </Text>
  );
}

/** A painted scene at its fitted size. */
export function PdfSingleLine({
  drawing,
  fonts = { text: TEXT_FONT, mono: MEASURE_FONT },
}: {
  drawing: PaintedScene;
  fonts?: PdfDiagramFonts;
}) {
  return (
    <Svg width={drawing.width} height={drawing.height} viewBox={drawing.viewBox}>
      <G>
        {drawing.items.map((item, i) => (
          <PdfPrimitive key={i} item={item} fonts={fonts} />
        ))}
      </G>
    </Svg>
  );
}
