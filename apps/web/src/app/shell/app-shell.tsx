// The signed-in frame. Tablet and up: a side rail with the navigation and the account. Phone: the
// same rail becomes a sheet opened from a Menu button at the bottom edge, where a thumb reaches
// while the other hand holds a probe.
import { roleLabels } from '@heatpath/contracts';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useState, type ReactNode } from 'react';
import { useLocation, useNavigate, useNavigation } from 'react-router';
import { Button } from '../../components/ui/button';
import { SignOutButton } from '../../features/auth/components/sign-out-button';
import { useMe } from '../../lib/auth';
import { useOutboxConnection } from '../../lib/outbox';
import { clearCachedData } from '../../lib/persist-cache';
import { Brand } from './brand';
import { MainNav } from './main-nav';
import { OfflineNotice } from './offline-notice';
import { UpdateNotice } from './update-notice';

export function AppShell({ children }: { children: ReactNode }) {
  const me = useMe();
  const queryClient = useQueryClient();
  // Answers, notes and photos queued on this tablet are sent from whichever screen is open.
  useOutboxConnection(me.id);
  const navigate = useNavigate();
  const navigation = useNavigation();
  const location = useLocation();
  const [menuOpen, setMenuOpen] = useState(false);
  const [shownFor, setShownFor] = useState(location.key);

  // Close the phone sheet once a link has taken the person somewhere.
  if (shownFor !== location.key) {
    setShownFor(location.key);
    setMenuOpen(false);
  }

  useEffect(() => {
    if (!menuOpen) return;
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') setMenuOpen(false);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [menuOpen]);

  return (
    <div className="min-h-dvh md:flex">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:fixed focus:top-2 focus:left-2 focus:z-50 focus:rounded-control focus:bg-surface focus:p-3"
      >
        Skip to content
      </a>

      <header className="flex items-center justify-between gap-3 border-b-2 border-line bg-surface px-4 md:hidden">
        <Brand />
        <span className="truncate text-sm text-ink-muted">{me.workshop.name}</span>
      </header>

      <div
        id="app-menu"
        className={
          (menuOpen ? 'flex' : 'hidden') +
          ' fixed inset-x-0 bottom-18 z-30 max-h-[calc(100dvh-6rem)] flex-col gap-6 overflow-y-auto ' +
          'border-t-2 border-line-strong bg-surface p-4 shadow-[0_-8px_24px_rgb(0_0_0/0.25)] ' +
          'md:sticky md:top-0 md:bottom-auto md:flex md:h-dvh md:max-h-none md:w-rail md:shrink-0 ' +
          'md:border-t-0 md:border-r-2 md:border-line md:shadow-none'
        }
      >
        <div className="hidden md:block">
          <Brand />
          <p className="mt-1 text-sm text-ink-muted">{me.workshop.name}</p>
        </div>
        <MainNav role={me.role} />
        <div className="mt-auto flex flex-col gap-3 border-t-2 border-line pt-4">
          <p className="flex flex-col">
            <span className="font-semibold">{me.name}</span>
            <span className="text-sm text-ink-muted">{roleLabels[me.role]}</span>
          </p>
          <SignOutButton
            onSignedOut={() =>
              // A shared tablet keeps nothing of the last person, on disk included.
              void Promise.resolve(navigate('/sign-in', { replace: true })).then(() =>
                clearCachedData(queryClient),
              )
            }
          />
        </div>
      </div>

      <div className="flex min-w-0 flex-1 flex-col pb-20 md:pb-0">
        <div className="sticky top-0 z-20">
          <OfflineNotice />
          <UpdateNotice />
          {navigation.state === 'loading' ? (
            <div role="status" className="bg-info-bg px-4 py-2 text-info-ink">
              Loading…
            </div>
          ) : null}
        </div>
        <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 p-4 sm:p-6 lg:p-8">
          {children}
        </main>
      </div>

      <div className="fixed inset-x-0 bottom-0 z-40 flex h-18 items-center gap-3 border-t-2 border-line-strong bg-surface px-4 md:hidden">
        <Button
          variant={menuOpen ? 'primary' : 'secondary'}
          aria-expanded={menuOpen}
          aria-controls="app-menu"
          onClick={() => setMenuOpen((open) => !open)}
          className="w-full"
        >
          {menuOpen ? 'Close menu' : 'Menu'}
        </Button>
      </div>
      {menuOpen ? (
        <div
          aria-hidden="true"
          className="fixed inset-0 z-20 bg-[rgb(0_0_0/0.4)] md:hidden"
          onClick={() => setMenuOpen(false)}
        />
      ) : null}
    </div>
  );
}
