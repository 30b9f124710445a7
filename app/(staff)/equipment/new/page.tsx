import Link from "next/link";
import styles from "@/components/equipment/equipment.module.css";
import { PressureCaution } from "@/components/equipment/pressure-caution";
import { RegisterEquipmentForm } from "@/components/equipment/register-equipment-form";
import { requirePageUser } from "@/lib/server/auth/require-page-user";

export const metadata = { title: "Register equipment" };

export default async function NewEquipmentPage() {
  const actor = await requirePageUser("equipment.manage");
  return (
    <>
      <p className="muted"><Link href="/equipment">Equipment</Link> ›</p>
      <h1>Register equipment</h1>
      <p className="muted">Add a cell, burette panel, pressure transducer or gauge, or thermometer. Record its calibration on its page once it is registered; until then it cannot be used for a run.</p>
      <section className={`card ${styles.narrowCard}`}>
        <PressureCaution />
        <RegisterEquipmentForm pressureUnit={actor.pressureUnit} />
      </section>
    </>
  );
}
