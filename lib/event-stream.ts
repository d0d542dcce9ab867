/**
 * A Server-Sent Events stream from our own server, through the browser's `EventSource`
 * (same origin, so the session cookie goes with it). One stream is one job on the server:
 * `close()` ends the connection, which the server takes as "cancel".
 *
 * The browser reconnects an `EventSource` on its own after an error; a reconnect would start
 * the job again from the beginning, so any error closes the stream and is reported instead.
 */
export type EventStream = { close: () => void };

export type EventStreamHandlers = {
  /** Named events (`event: nights`) with their `data` parsed as JSON. */
  events: Record<string, (data: unknown) => void>;
  /** The event after which the server ends the stream; the stream is closed when it arrives. */
  finalEvent?: string;
  /** The connection failed or broke before `finalEvent`. */
  onError: (message: string) => void;
};

/** A `data:` payload as JSON; undefined when it is not JSON. */
export function parseEventData(text: string): unknown {
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

/** Opens `url` as an event stream; nothing is delivered after `close()`. */
export function openEventStream(url: string, { events, finalEvent, onError }: EventStreamHandlers): EventStream {
  if (typeof EventSource === 'undefined') {
    onError('This browser cannot receive a streamed scan.');
    return { close: () => undefined };
  }
  const source = new EventSource(url, { withCredentials: true });
  let open = true;
  const close = () => {
    if (!open) return;
    open = false;
    source.close();
  };
  for (const [name, handle] of Object.entries(events)) {
    source.addEventListener(name, (event) => {
      if (!open) return;
      handle(parseEventData((event as MessageEvent<string>).data));
      if (name === finalEvent) close();
    });
  }
  source.onerror = () => {
    if (!open) return;
    close();
    onError('The connection to the server broke off. Start again.');
  };
  return { close };
}
