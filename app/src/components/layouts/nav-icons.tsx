import {
  Alert24Regular,
  Board24Regular,
  CalendarLtr24Regular,
  DataArea24Regular,
  Map24Regular,
  PeopleSettings24Regular,
  PlugConnected24Regular,
} from '@fluentui/react-icons';
import type { NavAreaKey } from '@hopwise/common';
import type { ReactElement } from 'react';

export const NAV_ICONS: Readonly<Record<NavAreaKey, ReactElement>> = {
  dashboard: <Board24Regular />,
  map: <Map24Regular />,
  links: <PlugConnected24Regular />,
  profiles: <DataArea24Regular />,
  nets: <CalendarLtr24Regular />,
  notices: <Alert24Regular />,
  admin: <PeopleSettings24Regular />,
};
