import { redirect } from "next/navigation";
import { AppShell } from "@/components/shell/app-shell";
import { getCurrentUser } from "@/lib/server/auth/current-user";
import { getLabName } from "@/lib/server/lab/get-lab-name";

export const dynamic = "force-dynamic";

export default async function PortalLayout({ children }: { children: React.ReactNode }) {
  const user = await getCurrentUser();
  if (!user) redirect("/sign-in");
  return <AppShell user={user} labName={await getLabName()}>{children}</AppShell>;
}
