import type { EventGroup } from '@/components/dry-run/timeline-rows';
import type { Severity } from '@/components/dry-run/totals-rows';
import type { Palette } from '@/constants/theme';

/**
 * Block colours of the timeline, from the palette only, so the red night view turns them into
 * shades of red that still differ in brightness. Light frames take the accent: it is the time
 * that counts; waiting is drawn hollow.
 */
export function groupFill(group: EventGroup, c: Palette): string {
  switch (group) {
    case 'expose':
      return c.accent;
    case 'pointing':
      return c.skyDay;
    case 'focus':
      return c.ok;
    case 'guide':
      return c.textMuted;
    case 'flip':
      return c.moon;
    case 'idle':
      return 'transparent';
    case 'rig':
      return c.textFaint;
  }
}

export function severityColour(severity: Severity, c: Palette): string {
  return severity === 'stop' ? c.danger : severity === 'warn' ? c.accent : c.textMuted;
}

export function severitySoft(severity: Severity, c: Palette): string {
  return severity === 'stop' ? c.dangerSoft : severity === 'warn' ? c.accentSoft : c.surfaceRaised;
}
