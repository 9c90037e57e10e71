/** The Office global: readiness, host and platform, and the requirement sets the preview honours. */

export const HostType = {
  Word: 'Word',
  Excel: 'Excel',
  PowerPoint: 'PowerPoint',
  Outlook: 'Outlook',
  OneNote: 'OneNote',
  Project: 'Project',
  Access: 'Access',
} as const;

export const PlatformType = {
  PC: 'PC',
  OfficeOnline: 'OfficeOnline',
  Mac: 'Mac',
  iOS: 'iOS',
  Android: 'Android',
  Universal: 'Universal',
} as const;

/** The highest version of each requirement set the shim stands behind. */
const SUPPORTED_SETS: Record<string, string> = {
  excelapi: '1.12',
  customfunctionsruntime: '1.3',
  sharedruntime: '1.1',
};

function versionParts(version: string): number[] | undefined {
  if (!/^\d+(\.\d+)*$/.test(version)) return undefined;
  return version.split('.').map(Number);
}

function compareVersions(a: number[], b: number[]): number {
  for (let i = 0; i < Math.max(a.length, b.length); i++) {
    const difference = (a[i] ?? 0) - (b[i] ?? 0);
    if (difference !== 0) return difference;
  }
  return 0;
}

/** Set names are matched without regard to case; a missing version means 1.1, as in Office.js. */
export function isSetSupported(name: string, minVersion?: string | number): boolean {
  const supported = typeof name === 'string' ? SUPPORTED_SETS[name.toLowerCase()] : undefined;
  if (supported === undefined) return false;
  const wanted = versionParts(minVersion === undefined ? '1.1' : String(minVersion));
  const available = versionParts(supported);
  return wanted !== undefined && available !== undefined && compareVersions(wanted, available) <= 0;
}

export interface ReadyInfo {
  host: string;
  platform: string;
}

export function createOffice() {
  const info: ReadyInfo = { host: HostType.Excel, platform: PlatformType.OfficeOnline };
  return {
    HostType,
    PlatformType,
    context: {
      host: info.host,
      platform: info.platform,
      displayLanguage: 'en-US',
      contentLanguage: 'en-US',
      requirements: { isSetSupported },
    },
    /** The host is ready as soon as the shim is installed; the callback still runs asynchronously. */
    onReady(callback?: (info: ReadyInfo) => void): Promise<ReadyInfo> {
      return Promise.resolve().then(() => {
        callback?.({ ...info });
        return { ...info };
      });
    },
  };
}
