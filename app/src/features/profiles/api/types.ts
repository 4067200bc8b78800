/**
 * Response shapes of the profile library, shared with the API through @hopwise/common, under the
 * names this feature uses.
 */
export type {
  InvertedSample,
  ProfileCompareItem as CompareItem,
  ProfileCompareResponse as CompareResult,
  ProfileData as ProfileBody,
  ProfileSource,
  ProfileView as ProfileRow,
  SoundingView as SoundingRow,
  TracePoint,
  UploadRowError,
  VerticalEcho,
  VerticalResponse as VerticalResult,
} from '@hopwise/common';
