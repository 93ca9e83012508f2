import { Group, Line, Text } from "react-konva";
import { niceTicks } from "@/lib/scales";
import { toScreen, visibleBox, type RunView } from "@/lib/runs/view/view-fit";

const RULE = "#d9d3c7";
const LABEL = "#4a4640";

/** Faint metre grid with labelled ticks along the bottom (x) and the left (elevation). */
export function AxisMarks({ view, width, height }: { view: RunView; width: number; height: number }) {
  const box = visibleBox(view, width, height);
  // About one label per 90 px across and 50 px up keeps labels apart at any zoom.
  const xs = niceTicks(box.minX, box.maxX, Math.max(2, Math.floor(width / 90)));
  const ys = niceTicks(box.minY, box.maxY, Math.max(2, Math.floor(height / 50)));
  return (
    <Group name="axes">
      {xs.map((x) => {
        const [sx] = toScreen(view, x, 0);
        return (
          <Group key={`x${x}`}>
            <Line points={[sx, 0, sx, height - 22]} stroke={RULE} strokeWidth={0.75} />
            <Text x={sx - 20} y={height - 17} width={40} align="center" text={String(x)} fontSize={10} fill={LABEL} />
          </Group>
        );
      })}
      {ys.map((y) => {
        const [, sy] = toScreen(view, 0, y);
        return (
          <Group key={`y${y}`}>
            <Line points={[46, sy, width, sy]} stroke={RULE} strokeWidth={0.75} />
            <Text x={2} y={sy - 6} width={40} align="right" text={String(y)} fontSize={10} fill={LABEL} />
          </Group>
        );
      })}
      <Text x={width - 60} y={height - 17} width={56} align="right" text="x (m)" fontSize={10} fill={LABEL} />
      <Text x={2} y={4} text="elev. (m)" fontSize={10} fill={LABEL} />
    </Group>
  );
}
