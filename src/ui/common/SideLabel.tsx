/**
 * A reference line's label in the right margin, nudged up or down by `dy` so that labels of
 * lines drawn close together do not print over one another. Recharts passes the line's viewBox.
 */
export function SideLabel({ viewBox, text, dy = 0, fill = "#56636e" }: { viewBox?: { x?: number; y?: number; width?: number }; text: string; dy?: number; fill?: string }) {
  const x = (viewBox?.x ?? 0) + (viewBox?.width ?? 0) + 6;
  const y = (viewBox?.y ?? 0) + dy + 4;
  return (
    <text x={x} y={y} fill={fill} fontSize={11}>
      {text}
    </text>
  );
}
