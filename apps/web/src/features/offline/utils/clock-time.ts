/** HH:MM on a 24-hour clock in the given zone (the shop's), as the offline notice shows when the data was fetched. */
export function clockTime(ms: number, timeZone: string | undefined): string {
  return new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23', ...(timeZone ? { timeZone } : {}) }).format(new Date(ms));
}
