import "server-only";
import type { DesignStudy } from "@/lib/design/types";
import type { SweepSettings } from "@/lib/design/sweep-plan";
import { fetchDesignContext } from "@/lib/design/design-context";
import { designStudySubject, designSweepKind, type DesignSweepInput } from "./design-sweep-job";
import { startJob } from "./start-job";
import type { JobView } from "./types";

/**
 * Queues a study's sweep for a worker with the study's parameters, the project's materials and its
 * required FS frozen in the job: the one start of a sweep, for the server sweep and the check of a
 * browser sweep (`ranInBrowser` then says what the browser reported).
 */
export async function queueDesignSweep(o: {
  study: DesignStudy;
  projectId: number;
  userId: number;
  settings: SweepSettings;
  ranInBrowser?: DesignSweepInput["ranInBrowser"];
}): Promise<JobView> {
  const context = await fetchDesignContext(o.projectId);
  return startJob(designSweepKind, {
    projectId: o.projectId,
    subject: designStudySubject(o.study.id),
    userId: o.userId,
    input: {
      studyId: o.study.id,
      params: o.study.parameters,
      materials: context.materials,
      settings: o.settings,
      required: context.required,
      ...(o.ranInBrowser ? { ranInBrowser: o.ranInBrowser } : {}),
    },
  });
}
