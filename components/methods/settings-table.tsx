import { SETTING_SOURCE_LABELS, type MethodSettingsDefinition } from "@/lib/methods/settings-definition";
import { ScrollArea } from "@/components/ui/scroll-area";

export function settingText(value: unknown, unit: string): string {
  if (value === null || value === undefined) return "not set";
  return unit ? `${String(value)} ${unit}` : String(value);
}

/**
 * A method's settings by group: each value with its unit, the default the app ships with and where that
 * default comes from (a standard, common practice, or from memory and to be checked).
 */
export function SettingsTable({ definition, values, previous }: { definition: MethodSettingsDefinition; values: Record<string, unknown>; previous?: Record<string, unknown> | null }) {
  const groups = [...new Set(definition.fields.map((f) => f.group))];
  return (
    <ScrollArea>
      <table className="list" data-testid="method-settings">
        <thead><tr><th>Setting</th><th>In force</th><th>Default</th><th>Source of the default</th></tr></thead>
        {groups.map((group) => (
          <tbody key={group}>
            <tr><th colSpan={4} scope="rowgroup">{group}</th></tr>
            {definition.fields.filter((f) => f.group === group).map((f) => {
              const changed = previous && JSON.stringify(previous[f.key]) !== JSON.stringify(values[f.key]);
              return (
                <tr key={f.key} data-setting={f.key}>
                  <td>{f.label}</td>
                  <td className="mono">{settingText(values[f.key], f.unit)}{changed && <span className="state state-warn"> changed</span>}</td>
                  <td className="mono muted">{settingText(definition.defaults[f.key], f.unit)}</td>
                  <td><strong>{SETTING_SOURCE_LABELS[f.source]}.</strong> <span className="muted">{f.note}</span></td>
                </tr>
              );
            })}
          </tbody>
        ))}
      </table>
    </ScrollArea>
  );
}
