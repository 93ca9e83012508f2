import { csvTemplates, type CsvTemplateKind } from "@/lib/section-io";
import { notFound } from "@/lib/api/errors";
import { apiRoute } from "@/lib/api/handler";

type Ctx = { params: Promise<{ kind: string }> };

/** The CSV templates, public: they hold only an invented example. */
export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const kind = (await params).kind as CsvTemplateKind;
  // Own keys only: "constructor" or "__proto__" are in every object's chain, not templates.
  if (!Object.hasOwn(csvTemplates, kind)) throw notFound("The template");
  return new Response(csvTemplates[kind] + "\r\n", {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="scarpline-${kind}-template.csv"`,
    },
  });
});
