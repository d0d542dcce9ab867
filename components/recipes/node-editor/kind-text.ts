import type { NodeKind } from '@/shared/recipe/types';

/** What each node kind is called in the composer. */
export const NODE_KIND_LABELS: Record<NodeKind, string> = {
  stage: 'Stage',
  repeat: 'Repeat',
  group: 'Group',
  cool: 'Cool camera',
  warm: 'Warm camera',
  slew: 'Slew',
  centre: 'Centre',
  rotate: 'Rotate',
  focus: 'Focus',
  expose: 'Expose',
  guide: 'Guide',
  meridian: 'Meridian',
  wait: 'Wait',
  flats: 'Flats',
  darks: 'Darks',
  park: 'Park',
  note: 'Note',
};

/** One line per kind: what the step does at the rig, in the trade's words. */
export const NODE_KIND_HINTS: Record<NodeKind, string> = {
  stage: 'Points everything inside at one target, within its time and sky limits.',
  repeat: 'Runs its steps again and again until a count, a time, a low altitude or a sun event.',
  group: 'Keeps a few steps together; changes nothing about how they run.',
  cool: 'Brings the sensor down to its set-point at a gentle rate before imaging.',
  warm: 'Lets the sensor back up towards ambient slowly, to avoid condensation.',
  slew: 'Moves the mount to the stage target or to a fixed sky or horizon position.',
  centre: 'Plate-solves and nudges the mount until the target sits within tolerance.',
  rotate: 'Turns the camera to a sky position angle or to the stage framing.',
  focus: 'Runs an autofocus curve through the focuser and settles at the best point.',
  expose: 'Takes light frames through one filter, with dithering between frames.',
  guide: 'Starts the guider and waits for the star to settle before imaging.',
  meridian: 'Decides what happens when the target crosses the meridian: flip, pause or end.',
  wait: 'Holds until a clock time, a sun event, a target altitude or a set duration.',
  flats: 'Takes flat frames from the panel or the twilight sky for chosen filters.',
  darks: 'Takes dark frames at set exposures and temperature with the optics capped.',
  park: 'Sends the mount to its park position.',
  note: 'A reminder for whoever reads the recipe; the rig does nothing.',
};
