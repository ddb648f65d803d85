// Single-line diagrams drawn from the design: pure layout, rendered by
// components/sld (SVG) and templates/pdf/shared/single-line.tsx (PDF).
export { layoutSingleLine, type SingleLineOptions } from "./layout-single-line";
export {
  SLD_COLORS,
  fitScale,
  primitiveBox,
  sceneBounds,
  shapeAttributes,
  textBox,
  textWidthPt,
  type Box,
  type SldCircle,
  type SldFill,
  type SldLine,
  type SldPath,
  type SldPrimitive,
  type SldRect,
  type SldScene,
  type SldShape,
  type SldText,
  type SldTone,
} from "./scene";
