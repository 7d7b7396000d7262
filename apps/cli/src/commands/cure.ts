import { readFileSync } from 'node:fs';
import { equivalentAge, parseCureReadingsCsv, type EquivalentAge } from '@gelpoint/core';
import { CliError, numberOption, parseOptions, type Command } from '../command';

const options = {
  readings: { type: 'string' },
  'ref-temp-c': { type: 'string' },
  'activation-kj-mol': { type: 'string' },
  'min-temp-c': { type: 'string' },
  'carry-h': { type: 'string' },
  json: { type: 'boolean' },
} as const;

function readLog(path: string): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (err) {
    const reason = err instanceof Error && 'code' in err ? String((err as NodeJS.ErrnoException).code) : 'unreadable';
    throw new CliError(`cannot read ${path} (${reason}); give the path of a time,tempC CSV file`);
  }
}

function summary(age: EquivalentAge, refTempC: number): string {
  const line = (label: string, value: string) => `${label.padEnd(24)}${value}`;
  const lines = [
    line('readings', `${age.readings} (${age.firstTime} to ${age.lastTime})`),
    line('elapsed', `${age.elapsedHours.toFixed(2)} h`),
    line(`equivalent at ${refTempC} °C`, `${age.equivalentHoursAtRef.toFixed(2)} h`),
    line('  of it on gaps', `${age.assumedEquivalentHours.toFixed(2)} h (${age.gaps.length} gap${age.gaps.length === 1 ? '' : 's'})`),
    line('below minimum', `${age.belowMinimumHours.toFixed(2)} h`),
    `each interval counts at the average of its two readings (ASTM C1074); a reading speaks for ${age.readingCarryH} h either side, beyond that a gap counts at the lower neighbouring reading`,
  ];
  return [...lines, ...age.cautions.map((c) => `${c.severity}: ${c.message}`)].join('\n');
}

/**
 * gelpoint cure: equivalent age at the reference temperature from a logged `time,tempC` CSV, from the
 * first reading to the last, each interval at the average of its two readings (ASTM C1074).
 */
export const command: Command = async (argv) => {
  const { values } = parseOptions(argv, options);
  if (!values.readings) throw new CliError('--readings is required (the path of a time,tempC CSV file)');
  const refTempC = numberOption(values['ref-temp-c'], 'ref-temp-c', { required: true })!;
  const activationKJPerMol = numberOption(values['activation-kj-mol'], 'activation-kj-mol', { required: true })!;
  const minTempC = numberOption(values['min-temp-c'], 'min-temp-c');
  const carryH = numberOption(values['carry-h'], 'carry-h');
  const parsed = parseCureReadingsCsv(readLog(values.readings));
  if (!parsed.ok) {
    // The message names the first rows and counts them all (the list of issues stops at a thousand).
    throw new CliError(`${values.readings}: ${parsed.error.message}`);
  }
  const age = equivalentAge({
    readings: parsed.value,
    refTempC,
    activationEnergyKJPerMol: activationKJPerMol,
    ...(minTempC === undefined ? {} : { minTempC }),
    ...(carryH === undefined ? {} : { readingCarryH: carryH }),
  });
  if (!age.ok) throw new CliError(age.error.message);
  if (!values.json) return summary(age.value, refTempC);
  const { spans, cautions, ...totals } = age.value;
  return JSON.stringify(
    {
      ...totals,
      refTempC,
      activationEnergyKJPerMol: activationKJPerMol,
      minTempC: minTempC ?? null,
      spans: spans.map(({ from, to, source, tempC, startTempC, endTempC, belowMinimum, equivalentHoursAtRef }) => ({
        from,
        to,
        source,
        tempC,
        startTempC,
        endTempC,
        belowMinimum,
        equivalentHoursAtRef,
      })),
      cautions: cautions.map(({ code, severity, message }) => ({ code, severity, message })),
    },
    null,
    2,
  );
};
