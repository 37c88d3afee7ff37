import path from 'node:path';

export const e2eStateFile = path.resolve('test-results/e2e-server.json');
export const e2eSessionSecret = 'e2e-session-secret-not-for-production-0123456789';
