import { PROFILE_SOURCES, type ProfileSource } from '@hopwise/common';

/** Plain names of where a profile came from (the API's `source`). */
export const SOURCE_LABELS: Record<ProfileSource, string> = {
  layers: 'Built from layers',
  upload: 'Uploaded',
  inversion: 'Inverted trace',
  feed: 'Conditions feed',
  model: 'Diurnal model (approximate)',
};

export const sourceLabel = (source: string): string =>
  SOURCE_LABELS[source as ProfileSource] ?? source;

/** Filter choices of the library (value '' = any source). */
export const SOURCE_FILTERS: { value: string; label: string }[] = [
  { value: '', label: 'Any source' },
  ...PROFILE_SOURCES.map((value) => ({ value, label: SOURCE_LABELS[value] })),
];
