import Link from "next/link";

export default function NotFound() {
  return (
    <div className="panel p-6">
      <h1 className="text-lg font-semibold">Not found</h1>
      <p className="mt-1 text-sm text-ink-soft">
        This page does not exist, or you are not a member of the project it belongs to.
      </p>
      <Link href="/projects" className="btn-quiet mt-4">
        Back to projects
      </Link>
    </div>
  );
}
