import Link from "next/link";

/** Shown with HTTP 403 when a page calls forbidden(): today the administrators' pages (lib/auth/page-access.ts). */
export default function Forbidden() {
  return (
    <div className="panel p-6" data-testid="forbidden">
      <h1 className="text-lg font-semibold">Administrators only</h1>
      <p className="mt-1 text-sm text-ink-soft">
        Your role does not open this page. Ask your team&apos;s administrator if something here needs changing.
      </p>
      <Link href="/projects" className="btn-quiet mt-4">
        Back to projects
      </Link>
    </div>
  );
}
