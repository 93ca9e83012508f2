import { redirect } from "next/navigation";
import { getSessionUser } from "@/lib/auth/session";

export default async function Home() {
  redirect((await getSessionUser()) ? "/projects" : "/sign-in");
}
