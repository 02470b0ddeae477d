/**
 * Runs asynchronous jobs one after another, in the order they were queued. Saves go through one queue
 * so two overlapping saves can never finish in the wrong order: the request that came last is written
 * last, so the newest edit is what stays on disk. A job that fails does not stop the ones after it.
 */
export class SerialQueue {
  #tail: Promise<unknown> = Promise.resolve();

  run<T>(job: () => Promise<T>): Promise<T> {
    const result = this.#tail.then(job, job);
    this.#tail = result.catch(() => undefined);
    return result;
  }
}
