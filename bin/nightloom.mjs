#!/usr/bin/env node
// `npx nightloom`: runs the TypeScript command line (bin/nightloom.ts) under tsx with the
// repository's tsconfig (for the @/ import paths), from whatever folder it is started in.
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));
const result = spawnSync(process.execPath, ['--import', import.meta.resolve('tsx'), path.join(here, 'nightloom.ts'), ...process.argv.slice(2)], {
  stdio: 'inherit',
  env: { ...process.env, TSX_TSCONFIG_PATH: path.join(here, '..', 'tsconfig.json') },
});
process.exit(result.status ?? 2);
