import { Group, Line, Text } from "react-konva";
import type { RunScene } from "@/lib/runs/view/run-scene";
import { toScreen, type RunView } from "@/lib/runs/view/view-fit";

/** Water colours: a mid blue line reads in greyscale print as well as in colour. */
export const WATER_LINE = "#1f5f99";
export const WATER_FILL = "#a9cce3";
const GROUND = "#1f1d1a";
const REGION_EDGE = "#7b756c";

/** Flat [x, y, …] metres to flat screen pixels. */
export function screenPoints(view: RunView, pts: readonly number[]): number[] {
  const out = new Array<number>(pts.length);
  for (let i = 0; i < pts.length; i += 2) {
    const [sx, sy] = toScreen(view, pts[i], pts[i + 1]);
    out[i] = sx;
    out[i + 1] = sy;
  }
  return out;
}

/** Regions in light material fills, ponded water, the ground surface, the phreatic line and the lowered pool. */
export function SectionShapes({ scene, view }: { scene: RunScene; view: RunView }) {
  const pool = scene.pool;
  return (
    <Group name="section">
      {scene.regions.map((r, i) => (
        <Line
          key={`region-${i}`}
          name="region"
          points={screenPoints(view, r.points)}
          closed
          fill={r.fill}
          opacity={0.75}
          stroke={REGION_EDGE}
          strokeWidth={0.75}
        />
      ))}
      {scene.ponds.map((p, i) => (
        <Line
          key={`pond-${i}`}
          name="ponded-water"
          points={screenPoints(view, p)}
          closed
          fill={WATER_FILL}
          opacity={0.6}
        />
      ))}
      {scene.ground.length >= 4 ? (
        <Line
          name="ground"
          points={screenPoints(view, scene.ground)}
          stroke={GROUND}
          strokeWidth={1.75}
          lineJoin="round"
        />
      ) : null}
      {scene.beforeDrawdown ? <BeforeDrawdown scene={scene} view={view} /> : null}
      {scene.phreatic ? (
        <Line
          name="phreatic"
          points={screenPoints(view, scene.phreatic)}
          stroke={WATER_LINE}
          strokeWidth={1.75}
          dash={[9, 5]}
        />
      ) : null}
      {pool
        ? pool.spans.map(([a, b], i) => {
            const [x1, y] = toScreen(view, a, pool.level);
            const [x2] = toScreen(view, b, pool.level);
            return (
              <Group key={`pool-${i}`} name="pool-after-drawdown">
                <Line points={[x1, y, x2, y]} stroke={WATER_LINE} strokeWidth={2} dash={[2, 4]} lineCap="round" />
                <Text
                  x={x1 + 4}
                  y={y + 4}
                  text={`pool after drawdown ${pool.level.toFixed(1)} m`}
                  fontSize={11}
                  fill={WATER_LINE}
                />
              </Group>
            );
          })
        : null}
    </Group>
  );
}

/** The line before drawdown, faint and labelled, so it is not read as the water analysed. */
function BeforeDrawdown({ scene, view }: { scene: RunScene; view: RunView }) {
  const before = scene.beforeDrawdown!;
  const [lx, ly] = toScreen(view, before.labelAt[0], before.labelAt[1]);
  const rightEdge = scene.ground.length >= 2 && before.labelAt[0] >= scene.ground[scene.ground.length - 2];
  const text =
    before.level !== null ? `before drawdown ${before.level.toFixed(1)} m (not analysed)` : "line before drawdown";
  return (
    <Group name="before-drawdown" opacity={0.45}>
      <Line points={screenPoints(view, before.points)} stroke={WATER_LINE} strokeWidth={1} dash={[3, 4]} />
      <Text
        x={rightEdge ? lx - 324 : lx + 4}
        y={ly - 15}
        width={320}
        align={rightEdge ? "right" : "left"}
        text={text}
        fontSize={11}
        fill={WATER_LINE}
      />
    </Group>
  );
}
