/** The Office global: readiness, on Excel on the web. */

export interface ReadyInfo {
  host: string;
  platform: string;
}

export function createOffice() {
  const info: ReadyInfo = { host: 'Excel', platform: 'OfficeOnline' };
  return {
    /** The host is ready as soon as the shim is installed; the callback still runs asynchronously. */
    onReady(callback?: (info: ReadyInfo) => void): Promise<ReadyInfo> {
      return Promise.resolve().then(() => {
        callback?.({ ...info });
        return { ...info };
      });
    },
  };
}
