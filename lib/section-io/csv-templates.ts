/**
 * Example files to download: the header and a few rows of an invented demo embankment. The geometry
 * template has three rows, the fewest that make a region; the others have two.
 */
export const csvTemplates = {
  geometry: ["region,material,x,y", "demo-bank,demo-fill,0,0", "demo-bank,,24,0", "demo-bank,,12,6"].join("\r\n"),
  phreatic: ["x,y", "0,4.5", "24,0.5"].join("\r\n"),
  materials: [
    "id,name,model,gamma,gammaSat,c,phi,su,suGradient,suDatum,cR,phiR,freeDraining,colour",
    "demo-fill,Demo compacted fill,mohr-coulomb,19.5,20.5,5,30,,,,12,14,no,#CC6677",
    "demo-filter,Demo filter gravel,mohr-coulomb,20,21,0,36,,,,,,yes,#DDCC77",
    "demo-clay,Demo soft clay,undrained,17,,,,20,1.5,-2,,,no,#332288",
  ].join("\r\n"),
} as const;

export type CsvTemplateKind = keyof typeof csvTemplates;
