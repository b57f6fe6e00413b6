import { describe, expect, it } from 'vitest';
import { feature } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';
import type { FeatureCollection, MultiPolygon, Position } from 'geojson';
import land50 from 'world-atlas/land-50m.json';
// @ts-expect-error -- a plain ES module script without type declarations
import { landForMap } from '../../scripts/map-data.mjs';

const topology = land50 as unknown as Topology;
const map = landForMap(feature(topology, topology.objects.land as GeometryCollection)) as FeatureCollection<MultiPolygon>;
const polygons = map.features[0]!.geometry.coordinates;

/** Planar even-odd point-in-polygon, the way a flat map fills a ring (not spherical). */
function covers(point: Position): boolean {
  return polygons.some((rings) => {
    let inside = false;
    for (const ring of rings) {
      for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
        const [xi, yi] = ring[i]!;
        const [xj, yj] = ring[j]!;
        if (yi! > point[1]! !== yj! > point[1]! && point[0]! < ((xj! - xi!) * (point[1]! - yi!)) / (yj! - yi!) + xi!) inside = !inside;
      }
    }
    return inside;
  });
}

describe('land outlines for the map', () => {
  it('keep every coordinate within −180…180°, so no ring crosses the antimeridian as a band', () => {
    for (const rings of polygons) for (const ring of rings) for (const [x] of ring) expect(Math.abs(x!)).toBeLessThanOrEqual(180);
  });

  it('still cover land on both sides of the antimeridian when filled as flat polygons', () => {
    // Chukotka (Russia) lies across 180°; Alaska, Siberia and the demo region's mainland must be land.
    for (const p of [[175, 66], [-175, 66.5], [-150, 65], [100, 65], [-110, 65]]) expect(covers(p), `${p}`).toBe(true);
    // The Bering Sea, the Arctic Ocean and the North Pacific are not.
    for (const p of [[-175, 58], [0, 88], [-150, 40]]) expect(covers(p), `${p}`).toBe(false);
  });
});
