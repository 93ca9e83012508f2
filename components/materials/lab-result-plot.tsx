import type { LabTestRecord } from "@/lib/materials/lab-kinds";
import { StrengthLinePlot } from "./plots/strength-line-plot";
import { SuProfilePlot } from "./plots/su-profile-plot";
import { CompactionPlot } from "./plots/compaction-plot";
import { PlasticityChart } from "./plots/plasticity-chart";

/** The plot that suits each kind of test set. */
export function LabResultPlot({ record }: { record: LabTestRecord }) {
  switch (record.kind) {
    case "direct-shear":
      return (
        <StrengthLinePlot
          title="Shear stress against normal stress"
          xLabel="Normal stress σn (kPa)"
          yLabel="Shear stress τ (kPa)"
          points={record.result.points}
          line={record.result.line}
        />
      );
    case "triaxial-cu": {
      const pq = record.result.space === "p-q";
      return (
        <StrengthLinePlot
          title={pq ? "Deviator stress against mean effective stress" : "t against s'"}
          xLabel={pq ? "p' (kPa)" : "s' = (σ1' + σ3')/2 (kPa)"}
          yLabel={pq ? "q (kPa)" : "t = (σ1 − σ3)/2 (kPa)"}
          points={record.result.points}
          line={record.result.line}
          second={
            record.result.totalStress
              ? {
                  label: pq
                    ? "total stresses at failure from σ3c, the R envelope (x is p, not p')"
                    : "total stresses at failure from σ3c, the R envelope (x is s, not s')",
                  points: record.result.totalStress.points,
                  line: record.result.totalStress.line,
                }
              : undefined
          }
        />
      );
    }
    case "undrained":
      return <SuProfilePlot result={record.result} />;
    case "compaction":
      return <CompactionPlot result={record.result} />;
    case "atterberg":
      return <PlasticityChart result={record.result} />;
    case "permeability":
      // A handful of readings of one number: the table of each reading's k says more than a plot.
      return null;
  }
}
