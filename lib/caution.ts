/** The caution every result view and export carries; one text for screens, CSV and PDF. */
export const CAUTION_TEXT =
  "These results support, and do not replace, the judgement of a qualified engineer. Check every input, and apply the codes and guidance that govern the work where it is built.";
