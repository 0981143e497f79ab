#!/usr/bin/env node
// Launcher kept in git so package managers can link the `girth` command before
// the TypeScript is built; the program itself is dist/main.js, bundled into
// dist/bin/ for start-up (scripts/bundle-bin.mjs).
import '../dist/bin/main.js';
