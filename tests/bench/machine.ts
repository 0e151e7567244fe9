/**
 * How busy the machine was while a figure was taken: load averages, and the share of the CPUs
 * that processes outside this benchmark (and the server and browser it started) used.
 */
import { execSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import { root } from './server-process';

const HZ = 100; // USER_HZ on Linux

function totalBusyTicks(): number | null {
  try {
    const cpu = fs.readFileSync('/proc/stat', 'utf8').split('\n')[0].trim().split(/\s+/).slice(1);
    const [user, nice, system, , , irq, softirq, steal] = cpu.map(Number);
    return user + nice + system + irq + softirq + (steal ?? 0);
  } catch {
    return null;
  }
}

/** CPU ticks used so far by this process and every process it started (and they started). */
function ownTicks(): number {
  const parents = new Map<number, number>();
  const ticks = new Map<number, number>();
  for (const name of fs.readdirSync('/proc')) {
    if (!/^\d+$/.test(name)) continue;
    try {
      const stat = fs.readFileSync(`/proc/${name}/stat`, 'utf8');
      const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
      parents.set(Number(name), Number(fields[1]));
      // utime, stime, cutime, cstime: the last two count children that have already exited.
      ticks.set(
        Number(name),
        Number(fields[11]) + Number(fields[12]) + Number(fields[13]) + Number(fields[14]),
      );
    } catch {
      // the process ended meanwhile
    }
  }
  const ours = (pid: number): boolean => {
    for (let p = pid, guard = 0; p > 1 && guard < 64; p = parents.get(p) ?? 0, guard++)
      if (p === process.pid) return true;
    return false;
  };
  let n = 0;
  for (const [pid, t] of ticks) if (ours(pid)) n += t;
  return n;
}

export interface BusyWindow {
  /** Share of all cores that other processes used in the window (0–1). */
  others: number;
  /** Share of all cores that the benchmark and its server and browser used (0–1). */
  ours: number;
  load1: number;
}

/** Start a window; `end()` says how busy the machine was during it. */
export function busyWindow() {
  const t0 = Date.now();
  const busy0 = totalBusyTicks();
  const own0 = ownTicks();
  return {
    end(): BusyWindow {
      const seconds = (Date.now() - t0) / 1000;
      const busy1 = totalBusyTicks();
      const own1 = ownTicks();
      const capacity = seconds * HZ * os.cpus().length;
      const ours = Math.max(0, own1 - own0) / capacity;
      const all = busy0 === null || busy1 === null ? ours : (busy1 - busy0) / capacity;
      return {
        others: Math.min(1, Math.max(0, all - ours)),
        ours: Math.min(1, ours),
        load1: os.loadavg()[0],
      };
    },
  };
}

export const pct = (share: number) => `${Math.round(share * 100)} %`;

/** A note to print beside a figure taken while others used much of the machine. */
export const busyNote = (w: BusyWindow) =>
  w.others >= 0.15 ? ` (machine busy: others used ${pct(w.others)} of the cores)` : '';

export interface MachineInfo {
  cores: number;
  cpu: string;
  memoryGiB: number;
  node: string;
  load: [number, number, number];
  commit: string;
  dirty: boolean;
  chromium: string;
}

export function machineInfo(): MachineInfo {
  const git = (args: string) => {
    try {
      return execSync(`git ${args}`, { cwd: root, encoding: 'utf8' }).trim();
    } catch {
      return '';
    }
  };
  let chromium = '';
  try {
    chromium = execSync(`${process.env.CHROMIUM_PATH ?? '/usr/bin/chromium'} --version`, {
      encoding: 'utf8',
      timeout: 20_000,
      stdio: ['ignore', 'pipe', 'ignore'],
    }).trim();
  } catch {
    chromium = 'not found';
  }
  const load = os.loadavg().map((n) => Math.round(n * 100) / 100) as [number, number, number];
  return {
    cores: os.cpus().length,
    cpu: os.cpus()[0]?.model ?? 'unknown',
    memoryGiB: Math.round(os.totalmem() / 2 ** 30),
    node: process.version,
    load,
    commit: git('rev-parse --short HEAD'),
    dirty: git('status --porcelain --untracked-files=no') !== '',
    chromium,
  };
}
