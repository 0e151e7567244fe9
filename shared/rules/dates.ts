/** Dates as the register stores them: ISO "YYYY-MM-DD"; a measurement's season is its year. */

const DAYS_BEFORE_MONTH = [0, 31, 59, 90, 120, 151, 181, 212, 243, 273, 304, 334];

function isLeap(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

function digits(s: string, from: number, to: number): number {
  let n = 0;
  for (let i = from; i < to; i++) {
    const d = s.charCodeAt(i) - 48;
    if (d < 0 || d > 9) return NaN;
    n = n * 10 + d;
  }
  return n;
}

function parts(iso: string): [number, number, number] {
  const year = digits(iso, 0, 4);
  const month = digits(iso, 5, 7);
  const day = digits(iso, 8, 10);
  if (!(year >= 0) || !(month >= 1 && month <= 12) || !(day >= 1 && day <= 31)) {
    throw new RangeError(`Not an ISO date: "${iso}"`);
  }
  return [year, month, day];
}

export function seasonOf(iso: string): number {
  return parts(iso)[0];
}

/** The date as a fractional year: 1 January = year + 0, 2 July ≈ year + 0.5. */
export function fractionalYear(iso: string): number {
  const [year, month, day] = parts(iso);
  const leap = isLeap(year);
  const dayIndex = DAYS_BEFORE_MONTH[month - 1] + (leap && month > 2 ? 1 : 0) + day - 1;
  return year + dayIndex / (leap ? 366 : 365);
}
