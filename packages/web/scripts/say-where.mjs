// After `pnpm web` builds the page: say where it is and what it is.
import { statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const page = join(dirname(fileURLToPath(import.meta.url)), '..', 'dist', 'index.html');
const kb = Math.round(statSync(page).size / 1024);
console.log(`Girth page: ${page}`);
console.log(`  ${pathToFileURL(page).href}`);
console.log(`  one self-contained file (${kb} KB): open it in a browser, copy it to a phone or a shared drive; it needs no network.`);
