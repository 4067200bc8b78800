/**
 * Client names for the shapes of the station, link and study routes. The shapes themselves are
 * shared with the API through @hopwise/common (common/src/links/types.ts).
 */
import type {
  ComputeResponses,
  CreateStudyRequest,
  LinkView,
  ReferenceProfileView,
  StationView,
  StudyFrequencyResult as CommonStudyFrequencyResult,
  StudyProfileSource,
  StudyView,
} from '@hopwise/common';

export type Station = StationView;
export type HfLink = LinkView;
export type Study = StudyView;
export type ReferenceProfile = ReferenceProfileView;
export type ProfileSource = StudyProfileSource;
export type StudyFrequencyResult = CommonStudyFrequencyResult;
export type StudyInput = CreateStudyRequest;

export interface StationInput {
  name: string;
  callSign?: string;
  latDeg: number;
  lonDeg: number;
  elevationM?: number;
  notes?: string;
  shared?: boolean;
}

export interface LinkInput {
  name: string;
  fromStationId: number;
  toStationId: number;
}

export type ObliqueResult = ComputeResponses['oblique'];
export type ObliqueModeResult = ObliqueResult['modes'][number];
export type VerticalResult = ComputeResponses['vertical'];
