import type { TestProject } from "vitest/node";
import { acquireStack, releaseStack } from "./stack";

/** Browser tests drive Chromium against the built app on its own database. */
export default async function setup(project: TestProject) {
  const stack = await acquireStack(true);
  project.provide("dbName", stack.dbName);
  project.provide("appUrl", stack.appUrl);
  project.provide("appEnv", stack.appEnv);
  project.provide("workerPids", stack.workerPids);
  return releaseStack;
}
