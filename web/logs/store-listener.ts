import type { ReactiveController, ReactiveControllerHost } from 'lit';
import type { DocumentStore } from '../state/document-store';

/**
 * Asks its host to update whenever the document store it is given fires
 * `change` (an edit, undo, redo or a new document), while the host is
 * connected. Call {@link follow} with the host's store in `willUpdate`.
 */
export class StoreListener implements ReactiveController {
  private store?: DocumentStore;
  private connected = false;
  private readonly changed = () => this.host.requestUpdate();

  constructor(private readonly host: ReactiveControllerHost) {
    host.addController(this);
  }

  /** Listens to `store` from now on (and no longer to the one before). */
  follow(store: DocumentStore | undefined): void {
    if (store === this.store) return;
    this.store?.removeEventListener('change', this.changed);
    this.store = store;
    if (this.connected) store?.addEventListener('change', this.changed);
  }

  hostConnected(): void {
    this.connected = true;
    this.store?.addEventListener('change', this.changed);
  }

  hostDisconnected(): void {
    this.connected = false;
    this.store?.removeEventListener('change', this.changed);
  }
}
