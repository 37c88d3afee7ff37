// Runs before each integration test file: gives the file its own database, copied from the
// migrated template, and publishes its address for the helpers.
import { randomBytes } from 'node:crypto';
import { inject } from 'vitest';
import { createDatabaseIfMissing } from '../../server/db/postgres';

const name = `t_${randomBytes(6).toString('hex')}`;
const adminUrl = inject('pgAdminUrl');

for (let attempt = 0; ; attempt += 1) {
  try {
    await createDatabaseIfMissing(adminUrl, name, inject('pgTemplate'));
    break;
  } catch (error) {
    // Two copies of one template at the same moment can collide; wait and try again.
    if (attempt >= 10) throw error;
    await new Promise((resolve) => setTimeout(resolve, 200 + 100 * attempt));
  }
}

const url = new URL(adminUrl);
url.pathname = `/${name}`;
process.env.BW_TEST_DATABASE_URL = url.toString();
