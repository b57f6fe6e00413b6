// Land outlines for the map (see copy-assets.mjs), as a function so a test can check the cut.
// world-atlas stitches polygons across the antimeridian (spherical coordinates). MapLibre draws
// coordinates as planar, so a ring that jumps from +180 to -180 becomes a band across the whole map,
// and in the globe view a polygon reaching past ±180 is drawn wrongly. So each ring's longitudes are
// first unwrapped to be continuous, then every polygon is cut at the antimeridian into pieces that
// lie within −180…180 (Sutherland–Hodgman clipping against the two meridians; a clip region that is
// a strip is convex, so concave coastlines clip correctly). Antarctica's ring encloses the pole and
// cannot be unwrapped: it is dropped, Thawline's sites lie north of 45° N.
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
    out.push([x, lat]);
    prev = x;
  }
  return out;
}

/** Clips a closed ring to x >= lo (keep = 1) or x <= hi (keep = -1) at the meridian `at`. */
function clipRing(ring, at, keep) {
  const inside = ([x]) => (keep > 0 ? x >= at : x <= at);
  const cross = ([x1, y1], [x2, y2]) => [at, y1 + ((at - x1) * (y2 - y1)) / (x2 - x1)];
  const out = [];
  for (let i = 0; i < ring.length - 1; i++) {
    const a = ring[i];
    const b = ring[i + 1];
    if (inside(a)) {
      out.push(a);
      if (!inside(b)) out.push(cross(a, b));
    } else if (inside(b)) out.push(cross(a, b));
  }
  if (out.length) out.push(out[0]);
  return out;
}

const round = ([x, y]) => [Math.round(x * 1e4) / 1e4, Math.round(y * 1e4) / 1e4];
/** world-atlas land (GeoJSON) → one MultiPolygon with every ring inside −180…180 and no pole-wrapping ring. */
export function landForMap(land) {
const polygons = [];
for (const f of land.features) {
  const list = f.geometry.type === 'MultiPolygon' ? f.geometry.coordinates : [f.geometry.coordinates];
  for (const poly of list) {
    if (poly[0].every(([, lat]) => lat < -55)) continue;
    const rings = poly.map(unwrapRing);
    const outer = rings[0];
    // A ring that does not close after unwrapping went round the pole; such rings are not drawable.
    if (Math.abs(outer[0][0] - outer[outer.length - 1][0]) > 1) continue;
    const xs = outer.map(([x]) => x);
    const minX = Math.min(...xs);
    const maxX = Math.max(...xs);
    for (let k = Math.floor((minX + 180) / 360); k <= Math.floor((maxX + 180) / 360); k++) {
      const lo = -180 + 360 * k;
      const hi = 180 + 360 * k;
      const pieces = rings
        .map((r) => (minX < lo || maxX > hi ? clipRing(clipRing(r, lo, 1), hi, -1) : r))
        .map((r) => r.map(([x, y]) => round([x - 360 * k, y])));
      if (pieces[0].length < 4) continue;
      polygons.push([pieces[0], ...pieces.slice(1).filter((r) => r.length >= 4)]);
    }
  }
}
return { type: 'FeatureCollection', features: [{ type: 'Feature', properties: {}, geometry: { type: 'MultiPolygon', coordinates: polygons } }] };
}
