"use client";

import { Circle, Layer, Text } from "react-konva";
import { worldToScreen, type ViewTransform } from "@/lib/editor/view-transform";
import { CANVAS_COLORS } from "../palette";
import type { EditorIssue } from "../types";
import { CANVAS_FONT } from "./draw-helpers";

interface IssueMarkersLayerProps {
  issues: EditorIssue[];
  view: ViewTransform;
  focused: number | null;
}

/**
 * A ring at each issue's location, numbered as in the issue list: solid for errors,
 * dashed for warnings, larger for the one picked in the list.
 */
export function IssueMarkersLayer({ issues, view, focused }: IssueMarkersLayerProps) {
  return (
    <Layer listening={false}>
      {issues.map((issue, i) => {
        if (!issue.at) return null;
        const [x, y] = worldToScreen(view, issue.at[0], issue.at[1]);
        const warning = issue.severity === "warning";
        const color = warning ? CANVAS_COLORS.warning : CANVAS_COLORS.error;
        const big = focused === i;
        return (
          <Circle
            key={i}
            x={x}
            y={y}
            radius={big ? 14 : 10}
            stroke={color}
            strokeWidth={big ? 3.5 : 2.5}
            dash={warning ? [4, 3] : undefined}
          />
        );
      })}
      {issues.map((issue, i) => {
        if (!issue.at) return null;
        const [x, y] = worldToScreen(view, issue.at[0], issue.at[1]);
        const color = issue.severity === "warning" ? CANVAS_COLORS.warning : CANVAS_COLORS.error;
        return (
          <Text
            key={`n${i}`}
            x={x + 11}
            y={y - 22}
            text={String(i + 1)}
            fontSize={11}
            fontStyle="bold"
            fontFamily={CANVAS_FONT}
            fill={color}
          />
        );
      })}
    </Layer>
  );
}
