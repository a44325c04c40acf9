// An in-memory stand-in for the browser's localStorage (the two methods the workbench uses), for tests.
export class MemoryStorage {
  items = new Map<string, string>();
  getItem(k: string) {
    return this.items.get(k) ?? null;
  }
  setItem(k: string, v: string) {
    this.items.set(k, v);
  }
}
