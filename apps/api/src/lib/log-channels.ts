// Which of the optional channels a temperature log has, read from its column mapping.
import type { LogChannel } from '@heatpath/contracts';
import type { ColumnMapping } from '@heatpath/temperature-log';

const channelOfRole = {
  intakeAir: 'intakeAirC',
  ambient: 'ambientC',
  vehicleSpeed: 'vehicleSpeedKph',
  engineSpeed: 'engineSpeedRpm',
  fanDuty: 'fanDuty',
} as const satisfies Record<
  keyof Omit<
    ColumnMapping,
    'time' | 'coolant' | 'temperatureUnit' | 'vehicleSpeedUnit' | 'timeUnit'
  >,
  LogChannel
>;

/** The optional channels a log has: those its mapping reads. */
export function channelsOf(mapping: ColumnMapping): LogChannel[] {
  return (Object.keys(channelOfRole) as (keyof typeof channelOfRole)[])
    .filter((role) => mapping[role] !== null && mapping[role] !== undefined)
    .map((role) => channelOfRole[role]);
}
