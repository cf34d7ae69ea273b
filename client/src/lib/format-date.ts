/**
 * The one way the app writes dates and times: day month-name year, with the time on a 24-hour clock where the
 * moment matters ("3 Mar 2025", "3 Mar 2025, 14:05"), in the browser's time zone.
 */
const day = new Intl.DateTimeFormat('en-GB', { year: 'numeric', month: 'short', day: 'numeric' });
const dayAndTime = new Intl.DateTimeFormat('en-GB', { year: 'numeric', month: 'short', day: 'numeric', hour: '2-digit', minute: '2-digit', hour12: false });

export const formatDay = (iso: string): string => day.format(new Date(iso));

export const formatDateTime = (iso: string): string => dayAndTime.format(new Date(iso));
