import { spawn, type SpawnOptions } from "node:child_process";

/** Runs a command to completion, output passed through; rejects with its exit code. */
export function runCommand(command: string, args: string[], options: SpawnOptions & { quiet?: boolean } = {}): Promise<string> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { ...options, stdio: options.quiet ? ["ignore", "pipe", "pipe"] : "inherit" });
    let output = "";
    child.stdout?.on("data", (chunk) => (output += chunk));
    child.stderr?.on("data", (chunk) => (output += chunk));
    child.on("error", reject);
    child.on("exit", (code, signal) => {
      if (code === 0) resolve(output);
      else reject(new Error(`${command} ${args.join(" ")} failed (${signal ?? `exit ${code}`})${options.quiet ? `:\n${output}` : ""}`));
    });
  });
}
