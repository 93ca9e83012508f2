import { Circle, Group, Line, Rect, Text } from "react-konva";
import type { RunScene } from "@/lib/runs/view/run-scene";
import { bandLineLabel } from "@/lib/runs/view/grid-edit";
import { toScreen, type RunView } from "@/lib/runs/view/view-fit";

export const SETUP_ACCENT = "#9c4722";
const EMPTY_HATCH = "#7b756c";

/**
 * The trial centres: as the FS map (a cell per centre, coloured by its lowest FS; hatched
 * where no circle was valid) when there is a result, else as dots; plus the tangent band.
 */
export function CentreGridShapes({ scene, view, setup = false }: { scene: RunScene; view: RunView; setup?: boolean }) {
  return (
    <Group name="centre-grid">
      {scene.cells.map((c) => {
        const [x1, y1] = toScreen(view, c.x1, c.y2);
        const [x2, y2] = toScreen(view, c.x2, c.y1);
        const w = x2 - x1;
        const h = y2 - y1;
        if (c.colour)
          return (
            <Rect
              key={`c${c.ix}-${c.iy}`}
              name="fs-cell"
              x={x1}
              y={y1}
              width={w}
              height={h}
              fill={c.colour}
              opacity={0.92}
            />
          );
        return (
          <Group key={`c${c.ix}-${c.iy}`} name="fs-cell-empty">
            <Rect x={x1} y={y1} width={w} height={h} stroke={EMPTY_HATCH} strokeWidth={0.5} opacity={0.6} />
            <Line points={[x1, y2, x2, y1]} stroke={EMPTY_HATCH} strokeWidth={0.75} opacity={0.7} />
          </Group>
        );
      })}
      {scene.centres.map(([x, y], i) => {
        const [sx, sy] = toScreen(view, x, y);
        return <Circle key={`d${i}`} name="trial-centre" x={sx} y={sy} radius={1.8} fill="#4a4640" />;
      })}
      {scene.gridBox && !setup
        ? (() => {
            const [x1, y1] = toScreen(view, scene.gridBox.minX, scene.gridBox.maxY);
            const [x2, y2] = toScreen(view, scene.gridBox.maxX, scene.gridBox.minY);
            return (
              <Rect
                name="grid-outline"
                x={x1}
                y={y1}
                width={x2 - x1}
                height={y2 - y1}
                stroke="#4a4640"
                strokeWidth={0.75}
                dash={[4, 3]}
              />
            );
          })()
        : null}
      {scene.band.length === 2 ? <Band scene={scene} view={view} lines={!setup} /> : null}
    </Group>
  );
}

/** The band between the two tangent levels (or radius reaches) across the drawn extent. */
function Band({ scene, view, lines }: { scene: RunScene; view: RunView; lines: boolean }) {
  const [a, b] = scene.band;
  const [x1, ya] = toScreen(view, scene.fitBox.minX, a.y);
  const [x2, yb] = toScreen(view, scene.fitBox.maxX, b.y);
  return (
    <Group name="tangent-band">
      <Rect x={x1} y={Math.min(ya, yb)} width={x2 - x1} height={Math.abs(yb - ya)} fill={SETUP_ACCENT} opacity={0.07} />
      {lines
        ? [a, b].map((l, i) => {
            const [, sy] = toScreen(view, 0, l.y);
            const upper = l.y >= (i === 0 ? b : a).y;
            return (
              <Group key={l.key}>
                <Line points={[x1, sy, x2, sy]} stroke={SETUP_ACCENT} strokeWidth={1} dash={[6, 4]} opacity={0.8} />
                <Text
                  x={x2 - 260}
                  y={upper ? sy - 14 : sy + 3}
                  width={254}
                  align="right"
                  text={bandLineLabel(l)}
                  fontSize={10}
                  fill={SETUP_ACCENT}
                />
              </Group>
            );
          })
        : null}
    </Group>
  );
}
