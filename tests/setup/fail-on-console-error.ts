import { afterEach, beforeEach, vi } from 'vitest';

// An unexpected console.error is a defect: it fails the test that caused it.
let errors: unknown[][] = [];

beforeEach(() => {
  errors = [];
  vi.spyOn(console, 'error').mockImplementation((...args: unknown[]) => {
    errors.push(args);
  });
});

afterEach(() => {
  vi.mocked(console.error).mockRestore();
  if (errors.length > 0) {
    const first = errors[0].map((a) => (a instanceof Error ? a.stack : String(a))).join(' ');
    throw new Error(`console.error was called ${errors.length} time(s); first: ${first}`);
  }
});
