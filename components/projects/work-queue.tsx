import Link from "next/link";
import { conditionWords, faceWords } from "@/lib/vocabulary";
import {
  daysWaiting,
  daysWaitingWords,
  type AuthorWork,
  type QueueRun,
  type ReviewerQueue,
} from "@/lib/review/work-queue";
import { PassMark, StatusBadge } from "@/components/runs/list/status-badge";

const runHref = (r: QueueRun, review = false) => `/projects/${r.projectId}/runs/${r.id}${review ? "/review" : ""}`;
const day = (iso: string | null) => (iso ? iso.slice(0, 10) : "—");

function Fs({ run }: { run: QueueRun }) {
  return (
    <span className="whitespace-nowrap">
      <PassMark fs={run.fsBishop} required={run.requiredFs} /> /{" "}
      <PassMark fs={run.fsFellenius} required={run.requiredFs} />{" "}
      <span className="text-ink-soft">against {run.requiredFs.toFixed(2)}</span>
    </span>
  );
}

function Section({
  id,
  title,
  count,
  children,
}: {
  id: string;
  title: string;
  count: number;
  children: React.ReactNode;
}) {
  return (
    <section aria-labelledby={`${id}-title`} className="panel p-4" data-testid={id}>
      <h2 id={`${id}-title`} className="mb-2 text-base font-semibold">
        {title} <span className="font-normal text-ink-soft">({count})</span>
      </h2>
      {children}
    </section>
  );
}

const TH = "px-2 py-1.5 text-left text-xs font-medium uppercase tracking-wide text-ink-soft";
const TD = "px-2 py-1.5 align-top";

/** Runs awaiting the reviewer's decision, the one waiting longest first. */
export function ReviewerQueuePanel({ queue, now }: { queue: ReviewerQueue; now: Date }) {
  return (
    <>
      <Section id="review-queue" title="Awaiting your review" count={queue.awaiting.length}>
        {queue.awaiting.length === 0 ? (
          <p className="text-sm text-ink-soft">Nothing waits for your review.</p>
        ) : (
          <div className="overflow-x-auto">
            <table className="w-full text-sm">
              <thead className="border-b border-rule">
                <tr>
                  <th className={TH}>Run</th>
                  <th className={TH}>Project</th>
                  <th className={TH}>Section</th>
                  <th className={TH}>Loading condition</th>
                  <th className={TH}>FS Bishop / ordinary</th>
                  <th className={TH}>Author</th>
                  <th className={`${TH} text-right`}>Waiting</th>
                </tr>
              </thead>
              <tbody>
                {queue.awaiting.map((r) => {
                  const days = daysWaiting(r.since, now);
                  return (
                    <tr key={r.id} className="border-b border-rule/60 last:border-0" data-testid="queue-row">
                      <td className={TD}>
                        <Link href={runHref(r, true)} className="font-medium text-clay-700 hover:underline">
                          {r.title}
                        </Link>
                        {r.revisesReturnedRunId !== null ? (
                          <div className="text-xs text-ink-soft">
                            Revision of run {r.revisesReturnedRunId}, which you returned
                          </div>
                        ) : null}
                      </td>
                      <td className={TD}>{r.projectName}</td>
                      <td className={TD}>
                        {r.sectionName} v{r.sectionVersion}
                      </td>
                      <td className={TD}>
                        {conditionWords(r.loadingCondition)},{" "}
                        <span className="text-ink-soft">{faceWords(r.face, true)}</span>
                      </td>
                      <td className={TD}>
                        <Fs run={r} />
                      </td>
                      <td className={TD}>{r.authorName}</td>
                      <td
                        className={`${TD} whitespace-nowrap text-right tabular-nums`}
                        title={`Submitted ${day(r.since)}`}
                      >
                        {daysWaitingWords(days)}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        )}
      </Section>
      {queue.revised.length > 0 ? (
        <Section id="revised-queue" title="You returned these; they came back revised" count={queue.revised.length}>
          <ul className="divide-y divide-rule/60 text-sm">
            {queue.revised.map(({ returned, revision }) => (
              <li key={revision.id} className="flex flex-wrap items-center gap-x-3 gap-y-1 py-1.5">
                <span>
                  Run {returned.id} “{returned.title}”, returned {day(returned.since)} →{" "}
                  <Link
                    href={runHref(revision, revision.status === "submitted")}
                    className="font-medium text-clay-700 hover:underline"
                  >
                    run {revision.id} “{revision.title}”
                  </Link>
                </span>
                <StatusBadge status={revision.status} belowRequired={revision.belowRequired} />
                <span className="text-ink-soft">
                  {revision.projectName} · {revision.authorName}
                </span>
              </li>
            ))}
          </ul>
        </Section>
      ) : null}
    </>
  );
}

function RunLines({ runs, empty, when }: { runs: QueueRun[]; empty: string; when: (r: QueueRun) => string }) {
  if (runs.length === 0) return <p className="text-sm text-ink-soft">{empty}</p>;
  return (
    <ul className="divide-y divide-rule/60 text-sm">
      {runs.map((r) => (
        <li key={r.id} className="py-1.5" data-testid="work-row">
          <Link href={runHref(r)} className="font-medium text-clay-700 hover:underline">
            {r.title}
          </Link>
          <div className="text-xs text-ink-soft">
            {r.projectName} · {r.sectionName} v{r.sectionVersion} · {conditionWords(r.loadingCondition)} · {when(r)}
          </div>
          <div className="text-xs">
            <Fs run={r} />
          </div>
        </li>
      ))}
    </ul>
  );
}

/** The author's own runs: what to finish, what to revise, what was signed off lately. */
export function AuthorWorkPanel({ work }: { work: AuthorWork }) {
  return (
    <div className="grid gap-4 md:grid-cols-3">
      <Section id="my-returned" title="Returned to you" count={work.returned.length}>
        <RunLines
          runs={work.returned}
          empty="No run waits for your revision."
          when={(r) => `returned ${day(r.since)}`}
        />
      </Section>
      <Section id="my-drafts" title="Your drafts" count={work.drafts.length}>
        <RunLines runs={work.drafts} empty="No drafts." when={(r) => `saved ${day(r.createdAt)}`} />
      </Section>
      <Section id="my-signed-off" title="Signed off in the last 30 days" count={work.signedOff.length}>
        <RunLines
          runs={work.signedOff}
          empty="No sign-offs in the last 30 days."
          when={(r) => `signed off ${day(r.since)}${r.belowRequired ? ", below the required FS" : ""}`}
        />
      </Section>
    </div>
  );
}
