/**
 * Speed figures for the input layer: parsing lengths, formatting them, and
 * resolving pipe names. Prints operations per second; asserts nothing.
 * Run: `pnpm exec vitest bench --run` in packages/pipes.
 */
import { bench, describe } from 'vitest';
import { formatLength, parseLength, resolvePipe } from '../src/index.js';

const lengths = [`2'-1 11/16"`, '25 11/16', '652mm', '25.6875in', '3/4"', '2ft', '.375'];
const names = ['NPS 16 STD', '1 1/2" xs', '6" 80S', 'DN 150 x 7.1', '406.4x9.53mm', '24" OD x 3/8"'];

describe('lengths', () => {
  bench('parseLength, 7 forms', () => {
    for (const t of lengths) parseLength(t, { unit: 'in' });
  });
  bench('formatLength ft-in 1/16, 100 values', () => {
    for (let i = 0; i < 100; i++) formatLength(i * 7.3, { format: 'ft-in' });
  });
});

describe('pipe names', () => {
  bench('resolvePipe, 6 forms', () => {
    for (const t of names) resolvePipe(t);
  });
});
