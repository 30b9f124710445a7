// The app's front door: Next.js's request handler behind a small HTTP server of our own (Next.js's
// documented "custom server"). It does what only the socket knows, or what must happen before Next.js reads
// a request, so that no request reaches the app in a shape it would answer with a server error:
// - the client's network address, for the password throttle, in a header the client cannot forge;
// - a malformed address (broken %-escapes, NUL or control characters, broken UTF-8) is answered 400;
// - a body over 1 MB (a data-logger file upload: 32 MB) is answered 413, and a body of unknown length 411,
//   before anything reads it;
// - the baseline security headers go on every response, static files included (lib/security).
// Plain JavaScript, so that Node runs it as it is. Usage: node scripts/app-server.mjs (PORT, NEXTAUTH_URL,
// SEEPLINE_TRUSTED_PROXIES from the environment).
import http from "node:http";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { baselineSecurityHeaders } from "../lib/security/baseline-headers.mjs";

export const CLIENT_ADDRESS_HEADER = "x-seepline-client-address";
/** The most a request body may hold: Next.js's own limit for server actions. */
export const BODY_LIMIT_BYTES = 1024 * 1024;
/** The data-logger upload route takes the file itself as its body (MAX_READINGS_FILE_BYTES in lib/validation/readings.ts). */
export const READINGS_UPLOAD_LIMIT_BYTES = 32 * 1024 * 1024;
const READINGS_UPLOAD = /^\/api\/runs\/[^/?#]+\/readings\/import(?:[?#]|$)/;

/** The client's address: the socket's peer, or what the nearest `trustedProxies` reverse proxies reported. */
export function clientAddress(request, trustedProxies = 0) {
  const peer = request.socket?.remoteAddress ?? "";
  if (trustedProxies > 0) {
    const chain = String(request.headers["x-forwarded-for"] ?? "").split(",").map((s) => s.trim()).filter(Boolean);
    const reported = chain[chain.length - trustedProxies];
    if (reported) return plainAddress(reported);
  }
  return plainAddress(peer);
}

function plainAddress(address) {
  const text = address.replace(/^::ffff:/, "");
  return /^[0-9A-Za-z.:%-]{1,100}$/.test(text) ? text : "unknown";
}

// Raw control characters, or a "%" not followed by two hex digits.
const RAW_PROBLEM = /[\u0000-\u001f\u007f]|%(?![0-9A-Fa-f]{2})/;
// After decoding: NUL and the other C0 control characters (a tab or line end has no place in an address either).
const DECODED_PROBLEM = /[\u0000-\u001f\u007f]/;

/** Why a request target cannot be served (a sentence), or null when it is well formed. */
export function targetProblem(rawTarget) {
  const target = String(rawTarget ?? "");
  const malformed = "That address is not well formed (a broken %-escape or a character that cannot appear in it); check the link.";
  if (target.length > 8000) return "That address is too long; check the link.";
  if (RAW_PROBLEM.test(target)) return malformed;
  const q = target.indexOf("?");
  const parts = q === -1 ? [target] : [target.slice(0, q), target.slice(q + 1).replace(/\+/g, " ")];
  for (const part of parts) {
    let decoded;
    try {
      decoded = decodeURIComponent(part);
    } catch {
      return malformed; // invalid UTF-8 behind the escapes, a lone surrogate among them
    }
    if (DECODED_PROBLEM.test(decoded)) return malformed;
  }
  return null;
}

/** Why a request body is refused before it is read ({ status, message }), or null. */
export function bodyProblem(request, limit = BODY_LIMIT_BYTES) {
  const method = String(request.method ?? "GET").toUpperCase();
  if (method === "GET" || method === "HEAD" || method === "OPTIONS") return null;
  const length = request.headers["content-length"];
  if (length !== undefined) {
    const bytes = Number(length);
    if (!Number.isFinite(bytes) || bytes < 0) return { status: 400, message: "The request states an impossible length." };
    if (READINGS_UPLOAD.test(String(request.url ?? "")) && method === "POST") {
      if (bytes > READINGS_UPLOAD_LIMIT_BYTES)
        return { status: 413, message: `The data-logger file is larger than ${READINGS_UPLOAD_LIMIT_BYTES / 1024 / 1024} MB, the most one import takes; split it by date and import each part in order. Nothing was saved.` };
      return null;
    }
    if (bytes > limit)
      return { status: 413, message: `The request is larger than ${Math.round(limit / 1024 / 1024)} MB, the most Seepline accepts at once; send less at a time (a long data-logger file can be imported in parts).` };
    return null;
  }
  if (request.headers["transfer-encoding"]) return { status: 411, message: "Send the request with its length (a Content-Length header); Seepline does not accept bodies of unknown length." };
  return null;
}

/** Bodies up to this size are read (and thrown away) before a refusal is sent; a larger one is not waited for. */
const DRAIN_LIMIT_BYTES = 64 * 1024 * 1024;

/**
 * Sends a refusal once the client has finished sending its body: a connection closed while the client is
 * still writing makes it see a broken pipe instead of the answer. The body is discarded, never handed on;
 * one larger than DRAIN_LIMIT_BYTES (declared or counted) is answered at once.
 */
function refuseAfterBody(request, answer) {
  let answered = false;
  const once = () => {
    if (!answered) {
      answered = true;
      answer();
    }
  };
  const declared = Number(request.headers["content-length"] ?? 0);
  const hasBody = declared > 0 || request.headers["transfer-encoding"] !== undefined;
  if (!hasBody || declared > DRAIN_LIMIT_BYTES || request.readableEnded) {
    once();
    request.resume();
    return;
  }
  let seen = 0;
  request.on("data", (chunk) => {
    seen += chunk.length;
    if (seen > DRAIN_LIMIT_BYTES) once();
  });
  request.on("end", once);
  request.on("error", once);
  request.on("close", once);
  request.resume();
}

/** The request listener: checks, headers and the client address, then Next.js's handler. */
export function frontDoor(handle, options) {
  const headers = baselineSecurityHeaders(options.https);
  return (request, response) => {
    for (const [name, value] of Object.entries(headers)) response.setHeader(name, value);
    const problem = targetProblem(request.url);
    const refusal = problem ? { status: 400, message: problem } : bodyProblem(request, options.bodyLimit);
    if (refusal) {
      response.statusCode = refusal.status;
      response.setHeader("Content-Type", "text/plain; charset=utf-8");
      response.setHeader("Connection", "close");
      refuseAfterBody(request, () => response.end(`${refusal.message}\n`));
      return;
    }
    request.headers[CLIENT_ADDRESS_HEADER] = clientAddress(request, options.trustedProxies);
    Promise.resolve(handle(request, response)).catch((error) => {
      console.error("request failed before the app answered", error);
      if (!response.headersSent) {
        response.statusCode = 500;
        response.end("A fault on the server; nothing was changed.\n");
      }
    });
  };
}

async function main() {
  const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
  const port = Number(process.env.PORT ?? 3000);
  const trustedProxies = Number(process.env.SEEPLINE_TRUSTED_PROXIES ?? 0);
  if (!Number.isInteger(trustedProxies) || trustedProxies < 0) throw new Error("SEEPLINE_TRUSTED_PROXIES must be a whole number (0 when no reverse proxy is in front).");
  const https = String(process.env.NEXTAUTH_URL ?? "").startsWith("https://");
  const { default: next } = await import("next");
  const app = next({ dev: false, dir: root, port, hostname: "localhost" });
  await app.prepare();
  const server = http.createServer(frontDoor(app.getRequestHandler(), { https, trustedProxies, bodyLimit: BODY_LIMIT_BYTES }));
  server.listen(port, () => console.log(`Seepline app listening on port ${port}`));
  const stop = () => {
    server.close(() => process.exit(0));
    server.closeIdleConnections();
    setTimeout(() => process.exit(0), 5000).unref();
  };
  process.on("SIGTERM", stop);
  process.on("SIGINT", stop);
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  main().catch((error) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
}
