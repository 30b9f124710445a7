/** A label inside a sentence: its first letter lower-cased, the rest kept ("Hydraulic conductivity (20 °C)" -> "hydraulic conductivity (20 °C)"). */
export function inSentence(label: string): string {
  return label.charAt(0).toLowerCase() + label.slice(1);
}
