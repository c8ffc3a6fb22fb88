/** Runs every benchmark in this folder (each exports run(): Promise<string>) and prints its table. */

import { readdirSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';

const folder = fileURLToPath(new URL('.', import.meta.url));
const only = process.argv.slice(2);
const files = readdirSync(folder)
  .filter((name) => name.endsWith('.bench.ts'))
  .filter((name) => only.length === 0 || only.some((word) => name.includes(word)))
  .sort();

for (const file of files) {
  const module = (await import(pathToFileURL(folder + file).href)) as { run: () => Promise<string> };
  console.log(`\n## ${file}\n`);
  console.log(await module.run());
}
console.log(`\nNode ${process.version}, ${process.platform} ${process.arch}`);
