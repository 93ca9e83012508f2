/** The e-mail notices a person can choose to receive; every one is on until they turn it off. */
export const NOTICE_KINDS = ["run-submitted", "run-approved", "run-returned"] as const;
export type NoticeKind = (typeof NOTICE_KINDS)[number];

export const NOTICE_INFO: Record<NoticeKind, { label: string; audience: string }> = {
  "run-submitted": { label: "A run is submitted for review", audience: "Sent to the project's reviewers." },
  "run-approved": { label: "My run is signed off", audience: "Sent to the run's author." },
  "run-returned": { label: "My run is returned with comments", audience: "Sent to the run's author." },
};
