/** What a form says when its request never reached the server (network down, server restarting). */
export const SERVER_UNREACHABLE =
  "The server could not be reached, so this may not have been saved. Check the connection, reload the page to see what was kept, and try again.";

/** A rejection that means the request did not get an answer (fetch's own errors), not a refusal by the app. */
export function isUnreachable(reason: unknown): boolean {
  const message = reason instanceof Error ? reason.message : typeof reason === "string" ? reason : "";
  return /failed to fetch|fetch failed|networkerror|load failed|network request failed|connection closed|an unexpected response was received from the server/i.test(message);
}
