/**
 * The localStorage key set while IndexedDB holds a saved workspace (a hint; IndexedDB stays the
 * record). Read by the workspace store (workspaceStore.ts) and by the built page's head script
 * (dashboard/sharedWorker.ts), which starts the demo's analysis early only when it is absent.
 */
export const SAVED_HINT = "brackline.workspace.saved";
