import { Circle, Path, Polygon, Rect, StyleSheet, Svg, Text, View } from "@react-pdf/renderer";
import type { CheckStatus } from "@/lib/engineering";
import { STATUS_COLORS, STATUS_WORDS } from "./styles";

// A result drawn as a shape and a word, so it reads the same printed in grey: a tick in a
// circle for pass, an exclamation mark in a triangle for review, a cross in a square for fail.
// Drawn as vector shapes because the text fonts carry no such symbols.

const s = StyleSheet.create({
  badge: { flexDirection: "row", alignItems: "center" },
  word: { fontWeight: 700, textTransform: "uppercase", letterSpacing: 0.4 },
});

/** The shape for a result, `size` points square. */
export function StatusGlyph({ status, size = 8 }: { status: CheckStatus; size?: number }) {
  const color = STATUS_COLORS[status];
  return (
    <Svg width={size} height={size} viewBox="0 0 10 10">
      {status === "pass" ? (
        <>
          <Circle cx={5} cy={5} r={5} fill={color} />
          <Path
            d="M2.6 5.2 L4.3 6.9 L7.5 3.4"
            stroke="#ffffff"
            strokeWidth={1.4}
            fill="none"
            strokeLinecap="round"
            strokeLinejoin="round"
          />
        </>
      ) : status === "warn" ? (
        <>
          <Polygon points="5,0.3 9.9,9.5 0.1,9.5" fill={color} />
          <Rect x={4.4} y={3.3} width={1.2} height={3.4} fill="#ffffff" />
          <Rect x={4.4} y={7.4} width={1.2} height={1.2} fill="#ffffff" />
        </>
      ) : (
        <>
          <Rect x={0.3} y={0.3} width={9.4} height={9.4} fill={color} />
          <Path d="M3 3 L7 7 M7 3 L3 7" stroke="#ffffff" strokeWidth={1.4} strokeLinecap="round" />
        </>
      )}
    </Svg>
  );
}

/** Shape and word side by side ("Pass", "Review", "Fail"), in the result's colour. */
export function StatusBadge({ status, fontSize = 7, label }: { status: CheckStatus; fontSize?: number; label?: string }) {
  return (
    <View style={s.badge}>
      <StatusGlyph status={status} size={fontSize + 1.5} />
      <Text style={[s.word, { fontSize, color: STATUS_COLORS[status], marginLeft: fontSize * 0.45 }]}>{label ?? STATUS_WORDS[status]}</Text>
    </View>
  );
}
