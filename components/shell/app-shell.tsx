import { navigationFor } from "@/lib/policy/navigation";
import { isStaffRole, ROLE_LABELS } from "@/lib/policy/permissions";
import type { CurrentUser } from "@/lib/server/auth/current-user";
import { ConnectionNotice } from "./connection-notice";
import { LabNumberSearch } from "./lab-number-search";
import { NavLinks } from "./nav-links";
import { SignOutButton } from "./sign-out-button";
import { Wordmark } from "./wordmark";

/**
 * The frame around every signed-in page: navigation for the role (the banner), the lab-number search, who
 * is signed in, sign-out, and the page itself as the one main landmark (the skip link's target).
 */
export function AppShell({ user, labName, children }: { user: CurrentUser; labName: string; children: React.ReactNode }) {
  return (
    <div className="shell">
      <header className="shell-side">
        <div>
          <Wordmark />
          <div className="lab-name">{labName}</div>
        </div>
        <NavLinks items={navigationFor(user.role)} />
      </header>
      <div className="shell-body">
        <div className="topline">
          {isStaffRole(user.role) ? <LabNumberSearch /> : <div />}
          <section className="who" aria-label="Signed in">
            <span data-testid="signed-in-as">{user.name}</span>
            <span className="role-tag">{ROLE_LABELS[user.role]}</span>
            <SignOutButton />
          </section>
        </div>
        <main className="shell-main" id="main" tabIndex={-1}>
          <ConnectionNotice />
          {children}
        </main>
      </div>
    </div>
  );
}
