import { useEffect, useId, useRef, useState } from 'react';
import { Link, useLocation, useMatch } from 'react-router-dom';
import { roleNames } from '../../shared/lib/roles';
import { useWorkspaces } from './api';
import { CreateWorkspaceForm } from './CreateWorkspaceForm';

/**
 * A disclosure in the header: the button names the open workspace, the panel lists the
 * others as links (so they work with keyboard, middle-click and screen readers like any
 * link) and offers a new one. Switching keeps the page you are on: members stays members.
 */
export function WorkspaceSwitcher() {
  const workspaces = useWorkspaces();
  const match = useMatch('/w/:workspaceId/*');
  const location = useLocation();
  // The panel remembers the page it was opened on, so it is closed again after any navigation.
  const [openOn, setOpenOn] = useState<string | null>(null);
  const open = openOn === location.pathname;
  const setOpen = (next: boolean) => setOpenOn(next ? location.pathname : null);
  const panelId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);

  const currentId = match?.params.workspaceId;
  const current = workspaces.data?.find((w) => w.id === currentId);
  const subpath = match?.params['*'] ?? '';

  // Close when a click lands outside the switcher or on Escape.
  useEffect(() => {
    if (!open) return;
    const onPointer = (event: PointerEvent) => {
      if (!rootRef.current?.contains(event.target as Node)) setOpenOn(null);
    };
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') {
        setOpenOn(null);
        buttonRef.current?.focus();
      }
    };
    document.addEventListener('pointerdown', onPointer);
    document.addEventListener('keydown', onKey);
    return () => {
      document.removeEventListener('pointerdown', onPointer);
      document.removeEventListener('keydown', onKey);
    };
  }, [open]);

  return (
    <div
      ref={rootRef}
      className="relative"
      onBlur={(event) => {
        // Tabbing out closes it; a click on the panel's own padding (no new focus) does not.
        const next = event.relatedTarget as Node | null;
        if (next !== null && !rootRef.current?.contains(next)) setOpen(false);
      }}
    >
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen(!open)}
        className="flex min-h-11 max-w-[16rem] items-center gap-3 rounded-seed border border-silt-300 bg-white px-3 py-1.5 text-left hover:border-loam-400"
      >
        <span className="flex min-w-0 flex-col leading-tight">
          <span className="text-xs font-medium tracking-wide text-loam-600 uppercase">Workspace</span>
          <span className="truncate font-medium text-humus-900">
            {current?.name ?? (workspaces.isPending ? 'Loading…' : 'Choose a workspace')}
          </span>
        </span>
        <svg
          viewBox="0 0 12 12"
          className={`size-3 shrink-0 text-loam-600 transition-transform ${open ? 'rotate-180' : ''}`}
          aria-hidden="true"
        >
          <path
            d="M2 4.5 6 8.5 10 4.5"
            fill="none"
            stroke="currentColor"
            strokeWidth="1.6"
            strokeLinecap="round"
          />
        </svg>
      </button>

      <div
        id={panelId}
        hidden={!open}
        className="absolute top-full left-0 z-30 mt-2 w-[min(22rem,calc(100vw-2rem))] rounded-seed border border-silt-300 bg-white p-2 shadow-sheet"
      >
        {workspaces.isError ? (
          <p role="alert" className="px-3 py-2 text-sm text-danger-700">
            {workspaces.error.message}
          </p>
        ) : null}
        <ul className="flex flex-col">
          {workspaces.data?.map((workspace) => {
            const isCurrent = workspace.id === currentId;
            return (
              <li key={workspace.id}>
                <Link
                  to={`/w/${workspace.id}${subpath ? `/${subpath}` : ''}`}
                  aria-current={isCurrent ? 'page' : undefined}
                  className={`flex items-center justify-between gap-3 rounded-seed px-3 py-2.5 hover:bg-silt-100 ${
                    isCurrent ? 'bg-silt-100 font-semibold' : ''
                  }`}
                >
                  <span className="flex min-w-0 items-center gap-2">
                    <span
                      className={`size-2 shrink-0 rounded-full ${isCurrent ? 'bg-russet-600' : 'bg-transparent'}`}
                      aria-hidden="true"
                    />
                    <span className="truncate">{workspace.name}</span>
                    {workspace.personal ? (
                      <span className="shrink-0 text-xs font-normal text-loam-600">(personal)</span>
                    ) : null}
                  </span>
                  <span className="shrink-0 text-sm font-normal text-loam-700">
                    {roleNames[workspace.role]}
                  </span>
                </Link>
              </li>
            );
          })}
        </ul>
        <div className="mt-2 border-t border-silt-200 px-3 pt-3 pb-2">
          <CreateWorkspaceForm onCreated={() => setOpen(false)} />
        </div>
      </div>
    </div>
  );
}
