/**
 * Startup options for every connection to the database: the session's time zone is UTC. Timestamp columns
 * are `timestamp without time zone` holding UTC, which Prisma reads and writes as UTC; anything the database
 * computes itself (CURRENT_TIMESTAMP, now(), casts) must agree, whatever the server's or role's own TimeZone.
 * No "server-only" marker: the migration adapter (prisma/) and test scripts use it too.
 */
export const UTC_SESSION_OPTIONS = "-c TimeZone=UTC";
