/** The check rows' names in the trade's words, by the row ids of compat-model.md §4 and §5. */
const CHECK_LABELS: Record<string, string> = {
  // coil rows
  driver: 'Driver type',
  connector: 'Connector',
  mounting: 'Mounting',
  'primary-window': 'Primary resistance',
  'driver-current': 'Driver current',
  'energy-cranking': 'Stored energy at cranking',
  'voltage-reserve': 'Voltage reserve',
  'secondary-window': 'Secondary resistance',
  'turns-ratio': 'Turns ratio',
  // plug rows
  thread: 'Thread',
  seat: 'Seat',
  reach: 'Reach',
  hex: 'Hex',
  heat: 'Heat range',
  resistor: 'Resistor',
  tip: 'Projected tip',
  gap: 'Gap',
};

export const checkLabel = (id: string): string => CHECK_LABELS[id] ?? id;
