'use client';

import { useMemo, useState } from 'react';
import Map, { Layer, Marker, NavigationControl, Source } from 'react-map-gl/maplibre';
import { setWorkerUrl } from 'maplibre-gl';
import type { StyleSpecification } from 'maplibre-gl';
import 'maplibre-gl/dist/maplibre-gl.css';
import Link from 'next/link';

// maplibre-gl 6 cannot locate its worker under Turbopack; it is copied to public/ at build time.
setWorkerUrl('/maplibre-gl-worker.mjs');

export interface MapCommunity {
  slug: string;
  name: string;
  latitudeDeg: number;
  longitudeDeg: number;
  profileCount: number;
}

// Our own style: sea in pale snow grey, land in sea-ice white with an ink outline. No tiles, no glyphs,
// nothing fetched from elsewhere: the land outlines are served from our origin (public/map).
const style: StyleSpecification = {
  version: 8,
  sources: {},
  layers: [{ id: 'sea', type: 'background', paint: { 'background-color': '#dbe8f1' } }],
};

/** The view that shows every community with room for its label (fitted by the map on load). */
function initialView(points: MapCommunity[]) {
  if (points.length === 0) return { longitude: -110, latitude: 66, zoom: 2.5 };
  const lons = points.map((p) => p.longitudeDeg);
  const lats = points.map((p) => p.latitudeDeg);
  if (points.length === 1) return { longitude: lons[0]!, latitude: lats[0]!, zoom: 6 };
  return {
    bounds: [
      [Math.min(...lons), Math.min(...lats)],
      [Math.max(...lons), Math.max(...lats)],
    ] as [[number, number], [number, number]],
    // Labels sit to the right of their marker: leave more room on that side.
    fitBoundsOptions: { padding: { top: 50, bottom: 50, left: 50, right: 130 }, maxZoom: 8 },
  };
}

export function CommunityMap({ communities, selected, label }: { communities: MapCommunity[]; selected?: string; label: string }) {
  const view = useMemo(() => initialView(communities), [communities]);
  const [hover, setHover] = useState<string | null>(null);
  return (
    <div className="h-[420px] w-full overflow-hidden rounded border border-snow-300" role="region" aria-label={label}>
      <Map initialViewState={view} mapStyle={style} attributionControl={{ compact: true, customAttribution: 'Land: Natural Earth' }} style={{ width: '100%', height: '100%' }}>
        <Source id="land" type="geojson" data="/map/land-50m.geojson" tolerance={0.1}>
          <Layer id="land-fill" type="fill" paint={{ 'fill-color': '#f6f8f9' }} />
          <Layer id="land-line" type="line" paint={{ 'line-color': '#8796a1', 'line-width': 0.6 }} />
        </Source>
        <NavigationControl position="top-right" showCompass={false} />
        {communities.map((c) => {
          const active = c.slug === selected || c.slug === hover;
          return (
            <Marker key={c.slug} longitude={c.longitudeDeg} latitude={c.latitudeDeg} anchor="left">
              <Link
                href={`/communities/${c.slug}`}
                onMouseEnter={() => setHover(c.slug)}
                onMouseLeave={() => setHover(null)}
                onFocus={() => setHover(c.slug)}
                onBlur={() => setHover(null)}
                className={`flex items-center gap-1 text-xs font-bold ${active ? 'text-frost-strong' : 'text-ink'}`}
              >
                <span aria-hidden className={`inline-block h-3 w-3 rotate-45 border-2 border-white ${active ? 'bg-thaw' : 'bg-frost'} shadow`} />
                <span className="rounded bg-ice-raised/90 px-1">{c.name}</span>
              </Link>
            </Marker>
          );
        })}
      </Map>
    </div>
  );
}
