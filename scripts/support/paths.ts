import path from "node:path";

export const ROOT = path.resolve(__dirname, "..", "..");
/** Everything the app keeps on this machine, git-ignored: the embedded database and the local auth secret. */
export const DATA_DIR = path.join(ROOT, ".data");
export const EMBEDDED_DB_DIR = path.join(DATA_DIR, "pglite");
export const AUTH_SECRET_FILE = path.join(DATA_DIR, "auth-secret");
export const BIN = (name: string) => path.join(ROOT, "node_modules", ".bin", name);
