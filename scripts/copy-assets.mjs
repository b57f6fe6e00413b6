// Run before every build (npm run build). Writes generated, git-ignored assets into public/:
//  - the maplibre-gl worker: maplibre-gl 6 cannot find its worker under Turbopack, so the map loads it
//    from our origin with setWorkerUrl (see the team's toolchain notes);
//  - the land outlines the map draws, from the world-atlas package (Natural Earth 1:50m land).
import { copyFileSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { feature } from 'topojson-client';

mkdirSync('public/map', { recursive: true });
copyFileSync('node_modules/maplibre-gl/dist/maplibre-gl-worker.mjs', 'public/maplibre-gl-worker.mjs');

const topology = JSON.parse(readFileSync('node_modules/world-atlas/land-50m.json', 'utf8'));
const land = feature(topology, topology.objects.land);

// world-atlas stitches polygons across the antimeridian (spherical coordinates). MapLibre draws
// coordinates as planar, so a ring that jumps from +180 to -180 becomes a band across the whole map.
// Unwrapping each ring's longitudes to be continuous (values past ±180 are drawn in the next world
// copy) removes the bands. Antarctica's ring encloses the pole and cannot be unwrapped: it is dropped,
// Thawline's sites lie north of 45° N.
function unwrapRing(ring) {
  const out = [];
  let offset = 0;
  let prev = null;
  for (const [lon, lat] of ring) {
    if (prev !== null) {
      const d = lon + offset - prev;
      if (d > 180) offset -= 360;
      else if (d < -180) offset += 360;
    }
    const x = lon + offset;
    out.push([Math.round(x * 1e4) / 1e4, Math.round(lat * 1e4) / 1e4]);
    prev = x;
  }
  return out;
}
const polygons = [];
for (const f of land.features) {
  const list = f.geometry.type === 'MultiPolygon' ? f.geometry.coordinates : [f.geometry.coordinates];
  for (const poly of list) {
    if (poly[0].every(([, lat]) => lat < -55)) continue;
    const rings = poly.map(unwrapRing);
    const outer = rings[0];
    // A ring that does not close after unwrapping went round the pole; such rings are not drawable.
    const [x0] = outer[0];
    const [x1] = outer[outer.length - 1];
    if (Math.abs(x0 - x1) > 1) continue;
    polygons.push(rings);
  }
}
writeFileSync(
  'public/map/land-50m.geojson',
  JSON.stringify({ type: 'FeatureCollection', features: [{ type: 'Feature', properties: {}, geometry: { type: 'MultiPolygon', coordinates: polygons } }] }),
);
