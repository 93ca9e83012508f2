"use client";

import { Fragment } from "react";
import { Layer, Line, Rect, Text } from "react-konva";
import type { LiveGhost } from "@/lib/live/live-ghosts";
import { arcPoints } from "@/lib/runs/view/circle-arc";
import { METHOD_STYLE } from "@/lib/runs/view/circle-styles";
import { METHOD_SHORT } from "@/lib/runs/view/warning-text";
import { worldToScreen, type ViewTransform } from "@/lib/editor/view-transform";
import { CANVAS_FONT } from "./draw-helpers";

interface LiveGhostLayerProps {
  ghosts: LiveGhost[];
  view: ViewTransform;
  /** Settling ghosts belong to a state the pointer has already left: drawn fainter. */
  settling: boolean;
}

/** Each method's critical circle of the live search, with its FS beside the upper end of the slip. */
export function LiveGhostLayer({ ghosts, view, settling }: LiveGhostLayerProps) {
  return (
    <Layer listening={false} opacity={settling ? 0.45 : 0.9}>
      {ghosts.map((g, i) => {
        const style = METHOD_STYLE[g.method];
        const pts = arcPoints(g.circle, g.entry, g.exit);
        const screen: number[] = [];
        for (let k = 0; k < pts.length; k += 2) screen.push(...worldToScreen(view, pts[k], pts[k + 1]));
        const top = g.entry[1] >= g.exit[1] ? g.entry : g.exit;
        const [lx, ly] = worldToScreen(view, top[0], top[1]);
        const label = `${METHOD_SHORT[g.method]} ${g.fs.toFixed(3)}`;
        return (
          <Fragment key={g.method}>
            <Line points={screen} stroke={style.colour} strokeWidth={style.width} dash={style.dash} />
            <Rect
              x={lx + 6}
              y={ly - 22 - i * 18}
              width={label.length * 7 + 8}
              height={16}
              fill="#fffdf8"
              opacity={0.85}
              cornerRadius={3}
            />
            <Text
              x={lx + 10}
              y={ly - 20 - i * 18}
              text={label}
              fontFamily={CANVAS_FONT}
              fontSize={12}
              fill={style.colour}
            />
          </Fragment>
        );
      })}
    </Layer>
  );
}
