import { requirePageUser } from "@/lib/auth/session";
import { fetchWorkCounts } from "@/db/queries/work-queue";
import { AppHeader } from "@/components/shell/app-header";
import { Providers } from "@/components/shell/providers";

export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const user = await requirePageUser();
  const counts = await fetchWorkCounts(user.id);
  return (
    <Providers>
      <AppHeader user={user} counts={counts} />
      <main className="mx-auto max-w-7xl px-4 py-6">{children}</main>
    </Providers>
  );
}
