import { Suspense, lazy, type ComponentType } from 'react';
import { Spinner } from '../components/ui';

/**
 * A page whose code loads when it is first shown, so the entry chunk (what the sign-in page and the
 * builder's portal download) does not carry it. Props pass through; a spinner shows meanwhile.
 *
 * @example const InboxPage = lazyPage(() => import('./components/InboxPage').then((m) => m.InboxPage));
 */
export function lazyPage<P extends object>(
  load: () => Promise<ComponentType<P>>,
): ComponentType<P> {
  const Lazy = lazy(async () => ({ default: await load() }));
  function LazyPage(props: P) {
    return (
      <Suspense
        fallback={
          <div className="flex justify-center py-16">
            <Spinner label="Loading…" />
          </div>
        }
      >
        <Lazy {...props} />
      </Suspense>
    );
  }
  return LazyPage;
}
