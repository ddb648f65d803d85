import { SLD_COLORS, fitScale, shapeAttributes, type SldPrimitive, type SldScene, type SldText } from "@/lib/sld";

// The single-line scene made ready for the PDF layout: colours resolved, shapes as SVG attributes and
// the scale that fits the drawing box worked out here, so the layout only places the primitives.

export type PaintedShape = { kind: Exclude<SldPrimitive["kind"], "text">; attributes: Record<string, string | number> };
export type PaintedText = Pick<SldText, "x" | "y" | "anchor" | "size" | "text"> & {
  kind: "text";
  fill: string;
  mono: boolean;
  bold: boolean;
};
export type PaintedItem = PaintedShape | PaintedText;

/** A scene scaled to a box: the drawn size in points, the scene's own viewBox and its painted items. */
export type PaintedScene = { width: number; height: number; viewBox: string; items: PaintedItem[] };

/** The scene fitted into width × height points, keeping its proportions. */
export function paintScene(scene: SldScene, width: number, height: number): PaintedScene {
  const scale = fitScale(scene, width, height);
  return {
    width: scene.width * scale,
    height: scene.height * scale,
    viewBox: `0 0 ${scene.width} ${scene.height}`,
    items: scene.items.map((item): PaintedItem =>
      item.kind === "text"
        ? {
            kind: "text",
            x: item.x,
            y: item.y,
            anchor: item.anchor,
            size: item.size,
            text: item.text,
            fill: SLD_COLORS[item.tone],
            mono: Boolean(item.mono),
            bold: item.weight === "bold",
          }
        : { kind: item.kind, attributes: shapeAttributes(item) },
    ),
  };
}
