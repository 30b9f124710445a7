import Link from "next/link";
import { StateTag } from "@/components/ui/state-tag";
import styles from "./genealogy-tree.module.css";

type Place = { code: string } | null;
type Genealogy = {
  labNumber: string;
  rolls: Array<{
    id: string; labNumber: string; rollNumber: string; state: string; storageLocation: Place;
    coupons: Array<{
      id: string; labNumber: string; positionInSample: string; state: string; storageLocation: Place;
      specimens: Array<{ id: string; labNumber: string; intendedMethodCode: string; state: string; storageLocation: Place }>;
    }>;
  }>;
};

const where = (p: Place) => <span className="muted mono">{p?.code ?? "no place"}</span>;

/** Shipment → rolls → coupons → specimens, each with its state and where it is. */
export function GenealogyTree({ genealogy }: { genealogy: Genealogy }) {
  return (
    <ul className={styles.tree} data-testid="genealogy">
      <li>
        <span className="mono">{genealogy.labNumber}</span> <span className="muted">shipment</span>
        <ul>
          {genealogy.rolls.map((roll) => (
            <li key={roll.id}>
              <Link href={`/samples/rolls/${roll.labNumber}`} className="mono">{roll.labNumber}</Link> roll {roll.rollNumber} <StateTag state={roll.state} /> {where(roll.storageLocation)}
              {roll.coupons.length > 0 && (
                <ul>
                  {roll.coupons.map((coupon) => (
                    <li key={coupon.id}>
                      <Link href={`/samples/coupons/${coupon.labNumber}`} className="mono">{coupon.labNumber}</Link> coupon, {coupon.positionInSample} <StateTag state={coupon.state} /> {where(coupon.storageLocation)}
                      {coupon.specimens.length > 0 && (
                        <ul>
                          {coupon.specimens.map((s) => (
                            <li key={s.id}>
                              <Link href={`/samples/specimens/${s.labNumber}`} className="mono">{s.labNumber}</Link> specimen for ASTM {s.intendedMethodCode} <StateTag state={s.state} /> {where(s.storageLocation)}
                            </li>
                          ))}
                        </ul>
                      )}
                    </li>
                  ))}
                </ul>
              )}
            </li>
          ))}
        </ul>
      </li>
    </ul>
  );
}
