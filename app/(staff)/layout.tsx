import { headers } from "next/headers";
import { forbidden, redirect } from "next/navigation";
import { AppShell } from "@/components/shell/app-shell";
import { isStaffRole } from "@/lib/policy/permissions";
import { getCurrentUser } from "@/lib/server/auth/current-user";
import { getLabName } from "@/lib/server/lab/get-lab-name";

export const dynamic = "force-dynamic";

// The lab's side of the app. Client users have their own portal; each page checks its own action too.
export default async function StaffLayout({ children }: { children: React.ReactNode }) {
  const user = await getCurrentUser();
  if (!user) redirect("/sign-in");
  if (!isStaffRole(user.role)) {
    // A client's start page is the portal; any other lab page is refused with the 403 page.
    if (((await headers()).get("x-seepline-path") ?? "/") === "/") redirect("/portal");
    forbidden();
  }
  return <AppShell user={user} labName={await getLabName()}>{children}</AppShell>;
}
