/**
 * The basemap shipped inside the app (no tile server, no network): Natural Earth 1:110 m land and
 * country borders from the `world-atlas` TopoJSON (public domain data, bundled by Vite with the
 * map route), converted to GeoJSON with topojson-client.
 */
import type { Feature, MultiLineString, MultiPolygon, Position } from 'geojson';
import { feature, mesh } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';
import countries110m from 'world-atlas/countries-110m.json';
import { splitAtAntimeridian, splitRingAtAntimeridian, type LonLatPair } from './map-geometry';

type WorldTopology = Topology<{ countries: GeometryCollection; land: GeometryCollection }>;

export interface Basemap {
  land: Feature<MultiPolygon>;
  borders: Feature<MultiLineString>;
}

const asPairs = (ring: Position[]) => ring.map(([lon, lat]) => [lon, lat] as LonLatPair);

function landFeature(topology: WorldTopology): Feature<MultiPolygon> {
  const collection = feature(topology, topology.objects.land);
  const polygons: Position[][][] = [];
  for (const item of collection.features) {
    const geometry = item.geometry;
    const list =
      geometry.type === 'MultiPolygon'
        ? geometry.coordinates
        : geometry.type === 'Polygon'
          ? [geometry.coordinates]
          : [];
    for (const polygon of list) {
      const [outer, ...holes] = polygon;
      const parts = splitRingAtAntimeridian(asPairs(outer));
      // Holes (inland seas) stay with the first part; none of them touches the antimeridian.
      parts.forEach((part, i) => polygons.push(i === 0 ? [part, ...holes] : [part]));
    }
  }
  return {
    type: 'Feature',
    properties: {},
    geometry: { type: 'MultiPolygon', coordinates: polygons },
  };
}

function bordersFeature(topology: WorldTopology): Feature<MultiLineString> {
  // Only the borders between two countries (a ≠ b): coastlines come from the land fill.
  const lines = mesh(topology, topology.objects.countries, (a, b) => a !== b);
  const coordinates: Position[][] = [];
  for (const line of lines.coordinates) {
    const points = line.map(([lonDeg, latDeg]) => ({ latDeg, lonDeg }));
    for (const piece of splitAtAntimeridian(points)) {
      coordinates.push(piece.map(([lat, lon]) => [lon, lat]));
    }
  }
  return { type: 'Feature', properties: {}, geometry: { type: 'MultiLineString', coordinates } };
}

let cached: Basemap | undefined;

export function loadBasemap(): Basemap {
  if (!cached) {
    const topology = countries110m as unknown as WorldTopology;
    cached = { land: landFeature(topology), borders: bordersFeature(topology) };
  }
  return cached;
}
