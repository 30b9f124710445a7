/** Headers for every response; HSTS only when the public address is HTTPS. */
export declare function baselineSecurityHeaders(https: boolean): Record<string, string>;
