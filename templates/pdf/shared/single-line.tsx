// The single-line diagram drawn as PDF vectors with @react-pdf's SVG
// primitives, from the same scene the browser shows.
import { Circle, G, Line, Path, Rect, Svg, Text } from "@react-pdf/renderer";
import { createElement, type ElementType } from "react";
import { SLD_COLORS, fitScale, shapeAttributes, type SldPrimitive, type SldScene } from "@/lib/sld";
import { MEASURE_FONT, TEXT_FONT } from "./fonts";

export interface PdfDiagramFonts {
  text: string;
  mono: string;
}

const SHAPES: Record<Exclude<SldPrimitive["kind"], "text">, ElementType> = { line: Line, rect: Rect, circle: Circle, path: Path };

function PdfPrimitive({ item, fonts }: { item: SldPrimitive; fonts: PdfDiagramFonts }) {
  if (item.kind !== "text") return createElement(SHAPES[item.kind], shapeAttributes(item));
  const font = { fontFamily: item.mono ? fonts.mono : fonts.text, fontSize: item.size, fontWeight: item.weight === "bold" ? 700 : 400 };
  // react-pdf loads a family only when it meets it in a style, so the face is named there as well.
  return (
    <Text x={item.x} y={item.y} textAnchor={item.anchor} fill={SLD_COLORS[item.tone]} {...font} style={font as never}>
      {item.text}
    </Text>
  );
}

/** The scene scaled to fit width × height points, keeping its proportions. */
export function PdfSingleLine({ scene, width, height, fonts = { text: TEXT_FONT, mono: MEASURE_FONT } }: { scene: SldScene; width: number; height: number; fonts?: PdfDiagramFonts }) {
  const scale = fitScale(scene, width, height);
  return (
    <Svg width={scene.width * scale} height={scene.height * scale} viewBox={`0 0 ${scene.width} ${scene.height}`}>
      <G>
        {scene.items.map((item, i) => (
          <PdfPrimitive key={i} item={item} fonts={fonts} />
        ))}
      </G>
    </Svg>
  );
}
