// Types of the front door's exports (scripts/app-server.mjs is plain JavaScript so that Node runs it as it is).
import type { IncomingMessage, ServerResponse } from "node:http";

type RequestLike = { method?: string; url?: string; headers: Record<string, string | string[] | undefined>; socket?: { remoteAddress?: string } };

export declare const CLIENT_ADDRESS_HEADER: string;
export declare const BODY_LIMIT_BYTES: number;
export declare const READINGS_UPLOAD_LIMIT_BYTES: number;
export declare function clientAddress(request: RequestLike, trustedProxies?: number): string;
export declare function targetProblem(rawTarget: string | undefined): string | null;
export declare function bodyProblem(request: RequestLike, limit?: number): { status: number; message: string } | null;
export declare function frontDoor(
  handle: (request: IncomingMessage, response: ServerResponse) => Promise<void> | void,
  options: { https: boolean; trustedProxies: number; bodyLimit: number },
): (request: IncomingMessage, response: ServerResponse) => void;
