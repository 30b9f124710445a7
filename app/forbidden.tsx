import Link from "next/link";
import { headers } from "next/headers";
import { Wordmark } from "@/components/shell/wordmark";
import { describeRolesAllowedTo } from "@/lib/policy/permissions";
import { actionForPath } from "@/lib/policy/routes";

// Shown with status 403 when a signed-in person opens a page their role does not allow.
export default async function Forbidden() {
  const path = (await headers()).get("x-seepline-path") ?? "";
  const action = actionForPath(path);
  return (
    <main className="plain" id="main" tabIndex={-1}>
      <div className="plain-card">
        <Wordmark />
        <div className="status-code">403 · not allowed</div>
        <h1>This page is not open to your role</h1>
        <p data-testid="needed-role">
          {action ? <>It needs the role <strong>{describeRolesAllowedTo(action)}</strong>.</> : "Your role does not include this page."}{" "}
          If you need it for your work, ask the lab administrator.
        </p>
        <p><Link href="/">Back to your start page</Link></p>
      </div>
    </main>
  );
}
