import type { EventSink } from './events';
import type { RenderContext } from './render-context';
import type { WebhookSender } from './webhook-sender';

/** Everything a route needs: state, catalogue, event delivery and the public address of the pages. */
export type FakeContext = RenderContext &
  EventSink & {
    sender: WebhookSender;
    /** How long the checkout page waits for the first webhook attempts before redirecting. */
    redirectWaitMs: number;
  };
