import type { TestProject } from 'vitest/node';
import { startThrowawayDb } from './throwaway-db';

declare module 'vitest' {
  export interface ProvidedContext {
    dbPort: number;
  }
}

export default async function setup(project: TestProject) {
  const db = await startThrowawayDb('asepta_test_0');
  project.provide('dbPort', db.port);
  return () => db.stop();
}
