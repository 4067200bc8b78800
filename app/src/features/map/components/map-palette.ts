import type { ThemeMode } from '@/components/theme/hopwise-theme';

/** Hopwise's own map colours, light and dark (our palette: teal brand, sand land, amber shared). */
export interface MapPalette {
  ocean: string;
  land: string;
  coast: string;
  border: string;
  graticule: string;
  night: string;
  ownStation: string;
  sharedStation: string;
  stationStroke: string;
  linkArc: string;
  controlPoint: string;
}

export const MAP_PALETTES: Record<ThemeMode, MapPalette> = {
  light: {
    ocean: '#D6EBEC',
    land: '#F4F1E6',
    coast: '#A9B9B4',
    border: '#C3B9A2',
    graticule: '#8FB3B6',
    night: '#0A2A3A',
    ownStation: '#137F7D',
    sharedStation: '#D98A1C',
    stationStroke: '#FFFFFF',
    linkArc: '#0A3E48',
    controlPoint: '#B4367A',
  },
  dark: {
    ocean: '#0A1A20',
    land: '#1E3036',
    coast: '#3E5A60',
    border: '#4B6266',
    graticule: '#2C4B52',
    night: '#000000',
    ownStation: '#39DFC0',
    sharedStation: '#F2B552',
    stationStroke: '#0A1A20',
    linkArc: '#89EBD0',
    controlPoint: '#F07AB8',
  },
};
