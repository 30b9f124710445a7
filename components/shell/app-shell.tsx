import { navigationFor } from "@/lib/policy/navigation";
import { isStaffRole, ROLE_LABELS } from "@/lib/policy/permissions";
import type { CurrentUser } from "@/lib/server/auth/current-user";
import { LabNumberSearch } from "./lab-number-search";
import { NavLinks } from "./nav-links";
import { SignOutButton } from "./sign-out-button";
import { Wordmark } from "./wordmark";

/** The frame around every signed-in page: navigation for the role, who is signed in, sign-out. */
export function AppShell({ user, labName, children }: { user: CurrentUser; labName: string; children: React.ReactNode }) {
  return (
    <div className="shell">
      <aside className="shell-side">
        <div>
          <Wordmark />
          <div className="lab-name">{labName}</div>
        </div>
        <NavLinks items={navigationFor(user.role)} />
      </aside>
      <main className="shell-main">
        <div className="topline">
          {isStaffRole(user.role) ? <LabNumberSearch /> : <div />}
          <div className="who">
            <span data-testid="signed-in-as">{user.name}</span>
            <span className="role-tag">{ROLE_LABELS[user.role]}</span>
            <SignOutButton />
          </div>
        </div>
        {children}
      </main>
    </div>
  );
}
