export type {
  NetScheduleView,
  NetStationView,
  NetView,
  ScheduleVersionView,
} from '@hopwise/common';
