"use client";

import { SWRConfig } from "swr";
import { swrFetcher } from "@/lib/client/fetch-json";

export function Providers({ children }: { children: React.ReactNode }) {
  return <SWRConfig value={{ fetcher: swrFetcher, revalidateOnFocus: false }}>{children}</SWRConfig>;
}
