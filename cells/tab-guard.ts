// Tells other tabs of this app, at once, that a sheet was saved, so a tab showing
// the same sheet can warn before it writes over it (the version stamp in the store
// is the final guard when a message is missed).

export interface SavedNotice {
  type: 'saved';
  key: string;
  version: number;
  writer: string;
}

export class TabGuard {
  readonly tabId = `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}`;
  private readonly channel: BroadcastChannel | undefined =
    typeof BroadcastChannel === 'function' ? new BroadcastChannel('loadtrace-sheets') : undefined;

  announce(key: string, version: number): void {
    this.channel?.postMessage({ type: 'saved', key, version, writer: this.tabId } satisfies SavedNotice);
  }

  /** Calls `listener` when another tab saves any sheet. */
  onForeignSave(listener: (notice: SavedNotice) => void): void {
    if (!this.channel) return;
    this.channel.onmessage = (e: MessageEvent<SavedNotice>) => {
      if (e.data?.type === 'saved' && e.data.writer !== this.tabId) listener(e.data);
    };
  }

  close(): void {
    this.channel?.close();
  }
}
