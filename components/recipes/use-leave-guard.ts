/** Native: the app is not closed like a tab; autosave flushes when the composer closes. */
export function useLeaveGuard(_unsaved: boolean): void {}
