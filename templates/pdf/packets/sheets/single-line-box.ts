// Room for the drawing in the body of an 11 × 17 sheet, below the sheet heading; the scene
// carries its own ratings line and notes, and is scaled down to fit when it is larger (the
// packet's printed facts paint it into this box).
export const DIAGRAM_BOX = { widthPt: 1130, heightPt: 585 };
