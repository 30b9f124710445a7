import { redirect } from "next/navigation";
import { LabNumberSearch } from "@/components/shell/lab-number-search";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { findItemAddress } from "@/lib/server/samples/find-item-by-lab-number";

export const metadata = { title: "Find" };

export default async function SearchPage({ searchParams }: { searchParams: Promise<{ q?: string | string[] }> }) {
  const actor = await requirePageUser("workspace.view");
  const raw = (await searchParams).q;
  const text = (Array.isArray(raw) ? raw[0] : raw)?.trim() ?? "";
  const address = text ? await findItemAddress({ actor, text }) : null;
  if (address) redirect(address);
  return (
    <>
      <h1>Find by lab number</h1>
      {text && <p className="notice notice-caution" role="status">No item has the lab number <strong className="mono">{text}</strong>. Lab numbers look like S26-00001 (shipment), R26-00001 (roll), C26-00001 (coupon), P26-00001 (specimen), T26-00001 (run).</p>}
      <LabNumberSearch label="Search again" />
    </>
  );
}
