// maplibre-gl 6 cannot find its worker under Turbopack: serve the worker from public/ and point
// maplibre at it with setWorkerUrl (see the team's toolchain notes). Run before every build.
import { copyFileSync, mkdirSync } from 'node:fs';

mkdirSync('public', { recursive: true });
copyFileSync('node_modules/maplibre-gl/dist/maplibre-gl-worker.mjs', 'public/maplibre-gl-worker.mjs');
