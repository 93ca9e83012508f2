/**
 * What the project's local stand-in servers (scripts/s3-fake.ts, scripts/smtp-fake.ts) share:
 * where their data lives, their pid files, and whether their port already answers.
 */
import fs from "node:fs";
import net from "node:net";
import path from "node:path";

export const ROOT = path.resolve(__dirname, "../..");
export const DATA_ROOT = process.env.SCARPLINE_DATA_DIR ?? path.join(ROOT, ".data");
/** Every stand-in listens on loopback only. */
export const HOST = "127.0.0.1";

/** A port number from an environment variable, or the default; a clear error names the variable. */
export function readPort(env: NodeJS.ProcessEnv, name: string, fallback: number): number {
  const port = Number(env[name] ?? fallback);
  if (!Number.isInteger(port) || port <= 0 || port > 65535)
    throw new Error(`${name} must be a port number, got '${env[name]}'`);
  return port;
}

/** The pid recorded in the pid file when that process is still alive, else null. */
export function livePid(pidFile: string): number | null {
  let pid: number;
  try {
    pid = Number(fs.readFileSync(pidFile, "utf8").trim());
  } catch {
    return null;
  }
  if (!Number.isInteger(pid) || pid <= 0) return null;
  try {
    process.kill(pid, 0);
    return pid;
  } catch {
    return null;
  }
}

/** Whether something accepts TCP connections on the loopback port. */
export function portAnswers(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect({ host: HOST, port, timeout: 2000 });
    socket.once("connect", () => {
      socket.destroy();
      resolve(true);
    });
    socket.once("error", () => resolve(false));
    socket.once("timeout", () => {
      socket.destroy();
      resolve(false);
    });
  });
}

/** A logger that prefixes the service's name, on stderr so stdout stays for the ready line. */
export const serviceLog = (name: string) => (message: string) => console.error(`[${name}] ${message}`);
