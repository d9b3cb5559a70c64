/**
 * `task` run one at a time: a call while it runs asks for one more run after it (calls in the
 * meantime fold into that one) and answers the running one's promise. Errors go to `onError`.
 */
export function serialRun(task: () => Promise<void>, onError: (e: Error) => void) {
  let running: Promise<void> | null = null;
  let again = false;
  const run = (): Promise<void> => {
    if (running) {
      again = true;
      return running;
    }
    running = task()
      .catch(onError)
      .finally(() => {
        running = null;
        if (again) {
          again = false;
          void run();
        }
      });
    return running;
  };
  return { run, idle: () => running ?? Promise.resolve() };
}
