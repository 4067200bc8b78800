import 'leaflet/dist/leaflet.css';
import { greatCirclePoints, nightPolygon } from '@hopwise/common';
import type { LatLngBoundsExpression, LatLngTuple, PathOptions } from 'leaflet';
import { useEffect, useMemo, useRef } from 'react';
import {
  CircleMarker,
  GeoJSON,
  MapContainer,
  Pane,
  Polygon,
  Polyline,
  Tooltip,
  useMap,
  useMapEvents,
} from 'react-leaflet';
import type { HfLink, Station } from '@/types/links';
import { formatKm } from '@/utils/format-geo';
import { loadBasemap } from '../utils/basemap';
import { graticuleLines, splitAtAntimeridian } from '../utils/map-geometry';
import type { MapPalette } from './map-palette';

/** Web Mercator stops at ≈ ±85.05°; the view stays inside one copy of the world. */
const WORLD_BOUNDS: LatLngBoundsExpression = [
  [-85, -180],
  [85, 180],
];
const ARC_SEGMENTS = 96;

interface WorldMapProps {
  stations: Station[];
  links: HfLink[];
  currentUserId: number;
  palette: MapPalette;
  now: Date;
  selectedStationId?: number;
  onSelectStation: (id: number) => void;
  onMapClick: (latDeg: number, lonDeg: number) => void;
}

function ClickToAdd({ onMapClick }: { onMapClick: WorldMapProps['onMapClick'] }) {
  useMapEvents({ click: (event) => onMapClick(event.latlng.lat, event.latlng.lng) });
  return null;
}

/** Frames the stations once, when they first arrive. */
function FitStations({ stations }: { stations: Station[] }) {
  const map = useMap();
  const done = useRef(false);
  useEffect(() => {
    if (done.current || stations.length === 0) return;
    done.current = true;
    const points = stations.map((s): LatLngTuple => [s.latDeg, s.lonDeg]);
    if (points.length === 1) map.setView(points[0], 4);
    else map.fitBounds(points, { padding: [48, 48], maxZoom: 5 });
  }, [map, stations]);
  return null;
}

export function WorldMap({
  stations,
  links,
  currentUserId,
  palette,
  now,
  selectedStationId,
  onSelectStation,
  onMapClick,
}: WorldMapProps) {
  const basemap = useMemo(loadBasemap, []);
  const graticule = useMemo(() => graticuleLines(15), []);
  const night = useMemo(
    () => nightPolygon(now).map((p): LatLngTuple => [p.latDeg, p.lonDeg]),
    [now],
  );
  const arcs = useMemo(
    () =>
      links
        .filter((link) => link.fromStation && link.toStation)
        .map((link) => ({
          link,
          pieces: splitAtAntimeridian(
            greatCirclePoints(link.fromStation, link.toStation, ARC_SEGMENTS),
          ),
        })),
    [links],
  );

  const landStyle: PathOptions = {
    fillColor: palette.land,
    fillOpacity: 1,
    color: palette.coast,
    weight: 0.8,
  };
  const borderStyle: PathOptions = { color: palette.border, weight: 0.7, fill: false };

  return (
    <MapContainer
      center={[30, 0]}
      zoom={2}
      minZoom={1}
      maxZoom={9}
      maxBounds={WORLD_BOUNDS}
      maxBoundsViscosity={1}
      worldCopyJump={false}
      attributionControl={false}
      style={{ height: '100%', width: '100%', background: palette.ocean }}
    >
      <Pane name="hw-basemap" style={{ zIndex: 250 }}>
        <GeoJSON data={basemap.land} style={landStyle} interactive={false} />
        <GeoJSON data={basemap.borders} style={borderStyle} interactive={false} />
        <Polyline
          positions={graticule}
          pathOptions={{ color: palette.graticule, weight: 0.6, dashArray: '2 4', opacity: 0.9 }}
          interactive={false}
        />
      </Pane>
      <Pane name="hw-night" style={{ zIndex: 300 }}>
        <Polygon
          positions={night}
          pathOptions={{
            fillColor: palette.night,
            fillOpacity: 0.22,
            color: palette.night,
            opacity: 0.5,
            weight: 1,
          }}
          interactive={false}
        />
      </Pane>
      {arcs.map(({ link, pieces }) => (
        <Polyline
          key={`arc-${link.id}`}
          positions={pieces}
          pathOptions={{ color: palette.linkArc, weight: 2.5, opacity: 0.9, lineCap: 'round' }}
          bubblingMouseEvents={false}
        >
          <Tooltip sticky>
            {link.name}: {formatKm(link.distanceKm)}
          </Tooltip>
        </Polyline>
      ))}
      {links.map((link) =>
        link.midpoint ? (
          <CircleMarker
            key={`mid-${link.id}`}
            center={[link.midpoint.latDeg, link.midpoint.lonDeg]}
            radius={4}
            pathOptions={{
              color: palette.controlPoint,
              weight: 2,
              fillColor: palette.stationStroke,
              fillOpacity: 1,
            }}
            bubblingMouseEvents={false}
          >
            <Tooltip>Control point (midpoint) of {link.name}</Tooltip>
          </CircleMarker>
        ) : null,
      )}
      {stations.map((station) => {
        const mine = station.ownerId === currentUserId;
        const selected = station.id === selectedStationId;
        return (
          <CircleMarker
            key={`station-${station.id}`}
            center={[station.latDeg, station.lonDeg]}
            radius={selected ? 10 : 7}
            pathOptions={{
              color: selected ? palette.linkArc : palette.stationStroke,
              weight: selected ? 3 : 2,
              fillColor: mine ? palette.ownStation : palette.sharedStation,
              fillOpacity: 1,
              // A dashed outline marks a station of yours that everyone can see.
              dashArray: mine && station.shared && !selected ? '3 2' : undefined,
            }}
            bubblingMouseEvents={false}
            eventHandlers={{ click: () => onSelectStation(station.id) }}
          >
            <Tooltip direction="top" offset={[0, -8]}>
              {station.name}
              {station.callSign ? ` (${station.callSign})` : ''}
            </Tooltip>
          </CircleMarker>
        );
      })}
      <ClickToAdd onMapClick={onMapClick} />
      <FitStations stations={stations} />
    </MapContainer>
  );
}
