import { Circle, Group, Label, Line, Rect, RegularPolygon, Tag, Text } from "react-konva";
import { arcPoints } from "@/lib/runs/view/circle-arc";
import type { CentreMark, DrawnCircle } from "@/lib/runs/view/circle-styles";
import type { RunScene } from "@/lib/runs/view/run-scene";
import { toScreen, type RunView } from "@/lib/runs/view/view-fit";
import { screenPoints } from "@/components/runs/result/canvas-section";

const HALO = "#ffffff";

/**
 * The lowest circles (faint), the slices of the critical circle, then each critical circle with its centre, radius and
 * label.
 */
export function CircleShapes({ scene, view }: { scene: RunScene; view: RunView }) {
  return (
    <Group name="circles">
      {scene.lowest.map((pts, i) => (
        <Line
          key={`low-${i}`}
          name="lowest-circle"
          points={screenPoints(view, pts)}
          stroke="#1f1d1a"
          strokeWidth={1}
          opacity={0.22}
        />
      ))}
      {scene.slices.map((s, i) => {
        const [x, yb] = toScreen(view, s.x, s.yBase);
        const [, yt] = toScreen(view, s.x, s.yTop);
        return (
          <Line
            key={`slice-${i}`}
            name="slice-side"
            points={[x, yb, x, yt]}
            stroke="#4a4640"
            strokeWidth={0.75}
            opacity={0.75}
          />
        );
      })}
      {scene.critical.map((c, i) => (
        <CriticalCircle key={c.key} c={c} view={view} index={i} />
      ))}
    </Group>
  );
}

function CriticalCircle({ c, view, index }: { c: DrawnCircle; view: RunView; index: number }) {
  const pts = screenPoints(view, arcPoints(c.circle, c.entry, c.exit));
  const [cx, cy] = toScreen(view, c.circle.xc, c.circle.yc);
  const [ex, ey] = toScreen(view, c.exit[0], c.exit[1]);
  const s = c.style;
  return (
    <Group name="critical-circle">
      {/* A white casing under each line keeps it readable over dark map cells and busy fills. */}
      <Line points={pts} stroke={HALO} strokeWidth={s.width + 3} opacity={0.85} lineCap="round" lineJoin="round" />
      <Line
        name={`critical-arc-${c.method ?? c.key}`}
        points={pts}
        stroke={s.colour}
        strokeWidth={s.width}
        dash={s.dash}
        lineCap="round"
        lineJoin="round"
      />
      <Line points={[cx, cy, ex, ey]} stroke={HALO} strokeWidth={3} opacity={0.7} />
      <Line name="radius-line" points={[cx, cy, ex, ey]} stroke={s.colour} strokeWidth={1} dash={[3, 3]} />
      <CentreMarkShape mark={s.mark} x={cx} y={cy} colour={s.colour} />
      <Label x={cx + 9} y={cy - 10 - index * 20} opacity={0.95}>
        <Tag fill={HALO} stroke={s.colour} strokeWidth={0.75} cornerRadius={3} />
        <Text text={c.label} fontSize={12} padding={3} fill="#1f1d1a" />
      </Label>
    </Group>
  );
}

/** Centre marks differ in shape per method or run, so they read without colour. */
function CentreMarkShape({ mark, x, y, colour }: { mark: CentreMark; x: number; y: number; colour: string }) {
  const common = { fill: colour, stroke: HALO, strokeWidth: 1.5, name: "centre-mark" };
  switch (mark) {
    case "dot":
      return <Circle x={x} y={y} radius={4.5} {...common} />;
    case "square":
      return <Rect x={x - 4.5} y={y - 4.5} width={9} height={9} {...common} />;
    case "diamond":
      return <RegularPolygon x={x} y={y} sides={4} radius={6} {...common} />;
    case "triangle":
      return <RegularPolygon x={x} y={y} sides={3} radius={6} {...common} />;
  }
}
