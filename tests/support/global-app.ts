// vitest globalSetup for browser tests: one running stack for the e2e project.
import type { TestProject } from 'vitest/node';
import { startAppStack } from './app-stack';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    appDatabaseUrl: string;
  }
}

export default async function setup(project: TestProject) {
  const stack = await startAppStack();
  project.provide('baseUrl', stack.baseUrl);
  project.provide('appDatabaseUrl', stack.databaseUrl);
  return () => stack.stop();
}
