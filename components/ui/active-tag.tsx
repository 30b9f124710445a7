/** Whether a record is in use or deactivated (records are deactivated, never deleted). */
export function ActiveTag({ active }: { active: boolean }) {
  return active ? <span className="state state-ok">active</span> : <span className="state state-bad">deactivated</span>;
}
