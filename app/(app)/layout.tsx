import { requirePageUser } from "@/lib/auth/session";
import { AppHeader } from "@/components/shell/app-header";
import { Providers } from "@/components/shell/providers";

export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const user = await requirePageUser();
  return (
    <Providers>
      <AppHeader user={user} />
      <main className="mx-auto max-w-7xl px-4 py-6">{children}</main>
    </Providers>
  );
}
