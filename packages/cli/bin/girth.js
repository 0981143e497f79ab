#!/usr/bin/env node
// Launcher kept in git so package managers can link the `girth` command before
// the TypeScript is built; the program itself is dist/main.js.
import '../dist/main.js';
