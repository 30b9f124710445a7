import { ShipmentForm } from "@/components/intake/shipment-form";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getIntakeOptions } from "@/lib/server/intake/get-intake-options";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

export const metadata = { title: "Log a shipment" };

export default async function NewShipmentPage() {
  const actor = await requirePageUser("shipment.create");
  const [options, zone] = await Promise.all([getIntakeOptions({ actor }), getLabTimeZone()]);
  return (
    <>
      <h1>Log a shipment</h1>
      <p className="muted">Record what arrived at the door. Each roll gets a lab number and a label; custody starts now.</p>
      <ShipmentForm options={options} zone={zone} />
    </>
  );
}
