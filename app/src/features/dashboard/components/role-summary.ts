import type { Role } from '@hopwise/common';

/** What each role gets done here (SPEC §1), in the user's words. */
export const ROLE_SUMMARY: Readonly<Record<Role, { intro: string; tasks: string[] }>> = {
  operator: {
    intro: 'You plan HF sky-wave links between your stations.',
    tasks: [
      'Enter your stations and the links between them, and see them on the map.',
      'Pick a profile and a time, and see the modes, MUF, elevation angles, group delay and multipath spread of a link.',
      'Save a study, read the shared profile library and the published schedules of your nets.',
      'Subscribe to notices when band conditions on your links change.',
    ],
  },
  netcontrol: {
    intro: 'You run nets: member stations and their assigned channels.',
    tasks: [
      'Create a net with its control station, member stations and assigned channels.',
      'Get a 24-hour schedule of the best usable channel per slot and publish it to the members.',
      'Members are notified when a published channel must change.',
      'Everything an operator can do: stations, links and link studies.',
    ],
  },
  analyst: {
    intro: 'You look after the ionospheric profiles the predictions are built on.',
    tasks: [
      'Upload sounding traces and profiles, and invert traces to true-height profiles.',
      'Compare profiles side by side: peaks, thickness, TEC, synthetic ionograms and delays on reference links.',
      'Publish profiles to the shared library.',
      'Everything an operator can do: stations, links and link studies.',
    ],
  },
  admin: {
    intro: 'You run this Hopwise installation.',
    tasks: [
      'Create accounts, change roles, and disable or enable users under Admin.',
      'Every other area is open to you as well: links, profiles, nets and notices.',
    ],
  },
};
