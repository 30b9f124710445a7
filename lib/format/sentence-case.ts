/**
 * A label inside a sentence: its first letter lower-cased, the rest kept ("Hydraulic conductivity (20 °C)" ->
 * "hydraulic conductivity (20 °C)"). A label that opens with an acronym keeps it ("GCL mass per unit area").
 */
export function inSentence(label: string): string {
  if (/^\p{Lu}{2}/u.test(label)) return label;
  return label.charAt(0).toLowerCase() + label.slice(1);
}
