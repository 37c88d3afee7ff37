// Placeholder until the 'parse' command is written; replaced by its owner.
export async function run(_args: string[]): Promise<number> {
  process.stderr.write('bellwether: the parse command is not available yet\n');
  return 1;
}
