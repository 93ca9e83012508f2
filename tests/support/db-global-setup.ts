import type { TestProject } from "vitest/node";
import { acquireStack, releaseStack } from "./stack";

/** Integration tests call route handlers over HTTP, so they need the app as well as the database. */
export default async function setup(project: TestProject) {
  const stack = await acquireStack(true);
  project.provide("dbName", stack.dbName);
  project.provide("appUrl", stack.appUrl);
  project.provide("appEnv", stack.appEnv);
  project.provide("workerPids", stack.workerPids);
  return releaseStack;
}

declare module "vitest" {
  export interface ProvidedContext {
    dbName: string;
    appUrl: string;
    appEnv: Record<string, string>;
    workerPids: number[];
  }
}
