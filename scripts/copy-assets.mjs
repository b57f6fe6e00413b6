// Run before every build (npm run build). Writes generated, git-ignored assets into public/:
//  - the maplibre-gl worker: maplibre-gl 6 cannot find its worker under Turbopack, so the map loads it
//    from our origin with setWorkerUrl (see the team's toolchain notes);
//  - the land outlines the map draws, from the world-atlas package (Natural Earth 1:50m land).
import { copyFileSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { feature } from 'topojson-client';
import { landForMap } from './map-data.mjs';

mkdirSync('public/map', { recursive: true });
copyFileSync('node_modules/maplibre-gl/dist/maplibre-gl-worker.mjs', 'public/maplibre-gl-worker.mjs');

const topology = JSON.parse(readFileSync('node_modules/world-atlas/land-50m.json', 'utf8'));
const land = feature(topology, topology.objects.land);

writeFileSync('public/map/land-50m.geojson', JSON.stringify(landForMap(land)));
