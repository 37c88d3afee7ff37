#!/usr/bin/env node
// The bellwether command line: `npm run --silent bellwether -- <command> ...`.
// Each command lives in its own module and returns the process exit code.
const usage = `usage: bellwether <command> [options]

commands:
  fit FILE.json [--model bell|acid|base|bell-plateau|auto] [--bootstrap N] [--timing]
  buffer list | recipe | capacity ...   (bellwether buffer --help)
  parse FILE                            reader file -> JSON of the blocks found
`;

type Command = { run: (args: string[]) => Promise<number> };

const commands: Record<string, () => Promise<Command>> = {
  fit: () => import('./fit'),
  buffer: () => import('./buffer'),
  parse: () => import('./parse'),
};

async function main(argv: string[]): Promise<number> {
  const [name, ...rest] = argv;
  if (!name || name === '--help' || name === '-h' || name === 'help') {
    process.stdout.write(usage);
    return name ? 0 : 2;
  }
  const load = commands[name];
  if (!load) {
    process.stderr.write(`bellwether: unknown command '${name}'\n\n${usage}`);
    return 2;
  }
  const command = await load();
  return command.run(rest);
}

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    process.stderr.write(`bellwether: ${error instanceof Error ? error.message : String(error)}\n`);
    process.exitCode = 1;
  },
);
