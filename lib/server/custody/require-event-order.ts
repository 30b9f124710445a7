import "server-only";
import { eventOrderProblem } from "@/lib/custody/event-order";
import { AppError } from "@/lib/errors/app-error";

/**
 * Refuses a time that breaks the order of events (see lib/custody/event-order.ts), naming the event it
 * conflicts with on the form field `field`. Nothing is saved: callers ask before their first write.
 */
export function requireEventOrder(field: string, input: Parameters<typeof eventOrderProblem>[0]): void {
  const problem = eventOrderProblem(input);
  if (problem) throw new AppError("INVALID_INPUT", problem, { fieldErrors: { [field]: problem } });
}
