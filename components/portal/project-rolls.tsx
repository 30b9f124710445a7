import { describeRollProgress } from "@/lib/portal/roll-progress";
import type { PortalProject } from "@/lib/server/portal/get-portal-project";
import styles from "./portal.module.css";
import { RollProgress } from "./roll-progress";
import { ScrollArea } from "@/components/ui/scroll-area";

/** The project's rolls, one row each, with where the roll stands in the chain. */
export function ProjectRolls({ rolls, zone = "UTC" }: { rolls: PortalProject["rolls"]; zone?: string }) {
  if (rolls.length === 0) return <p className="empty">No rolls of this project have arrived yet.</p>;
  return (
    <ScrollArea>
      <table className="list" data-testid="portal-rolls">
        <thead><tr><th>Roll</th><th>Shipment</th><th>Now</th><th>Progress</th></tr></thead>
        <tbody>
          {rolls.map((roll) => (
            <tr key={roll.labNumber} data-roll={roll.labNumber}>
              <td>
                <div className={styles.rollHead}>{roll.rollNumber}</div>
                <div className="muted">lot {roll.lotNumber}</div>
                <div className="muted mono">{roll.labNumber}</div>
              </td>
              <td className="mono">{roll.shipmentLabNumber}</td>
              <td>
                {describeRollProgress(roll.progress)}
                {roll.certificateNumbers.length > 0 && <div className="muted mono">{roll.certificateNumbers.join(", ")}</div>}
              </td>
              <td className={styles.progressCell}><RollProgress steps={roll.progress} rollLabel={roll.rollNumber} zone={zone} /></td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollArea>
  );
}
