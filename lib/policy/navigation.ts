import { can, type Action, type RoleName } from "./permissions";

export type NavItem = { href: string; label: string; section: "Work" | "Lab" | "Account"; action: Action };

// Every entry names the action it needs, so a role sees exactly the places it may open.
const NAV_ITEMS: NavItem[] = [
  { href: "/", label: "Today", section: "Work", action: "workspace.view" },
  { href: "/portal", label: "Our projects", section: "Work", action: "portal.view" },
  { href: "/portal/certificates", label: "Certificates", section: "Work", action: "portal.view" },
  { href: "/intake", label: "Intake", section: "Work", action: "shipment.view" },
  { href: "/samples", label: "Samples", section: "Work", action: "sample.view" },
  { href: "/labels", label: "Labels", section: "Work", action: "sample.view" },
  { href: "/cells", label: "Cell board", section: "Work", action: "run.view" },
  { href: "/runs", label: "Runs", section: "Work", action: "run.view" },
  { href: "/review", label: "Review", section: "Work", action: "run.review" },
  { href: "/certificates", label: "Certificates", section: "Work", action: "certificate.view" },
  { href: "/equipment", label: "Equipment", section: "Lab", action: "equipment.view" },
  { href: "/specifications", label: "Specifications", section: "Lab", action: "certificate.view" },
  { href: "/methods", label: "Methods", section: "Lab", action: "run.view" },
  { href: "/admin/clients", label: "Clients", section: "Lab", action: "client.manage" },
  { href: "/admin/users", label: "People", section: "Lab", action: "user.manage" },
  { href: "/admin/api-tokens", label: "API tokens", section: "Lab", action: "user.manage" },
  { href: "/admin/lab", label: "Lab details", section: "Lab", action: "lab.configure" },
  { href: "/admin/audit", label: "Audit trail", section: "Lab", action: "audit.view" },
  { href: "/account", label: "My account", section: "Account", action: "account.self" },
];

/** The navigation a role sees, in order. */
export function navigationFor(role: RoleName): NavItem[] {
  return NAV_ITEMS.filter((item) => can(role, item.action));
}
