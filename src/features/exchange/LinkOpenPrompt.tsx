// Opening a shared link (#plan=...): the link is checked through the file door, then the user is
// asked before the current plan is replaced. A bad link says what is wrong and changes nothing.
import { useEffect, useState } from 'react';
import { decodePlanLink, isPlanLinkFragment } from '@/schema/planLink';
import type { PlanDocument } from '@/schema/planDocument';
import type { PlanIssue } from '@/schema/parsePlan';
import { useAppStore } from '@/state/useAppStore';
import { PlanIssueList } from './PlanIssueList';

type LinkState = { kind: 'none' } | { kind: 'ask'; document: PlanDocument } | { kind: 'bad'; issues: PlanIssue[] };

/** Leave the link's fragment for the workbench route, so a reload does not ask again. */
function clearLinkFragment() {
  window.history.replaceState(null, '', `${window.location.pathname}${window.location.search}#/`);
  window.dispatchEvent(new HashChangeEvent('hashchange'));
}

export function LinkOpenPrompt() {
  const currentName = useAppStore((s) => s.document.main.name);
  const commitDocument = useAppStore((s) => s.commitDocument);
  const [state, setState] = useState<LinkState>({ kind: 'none' });

  useEffect(() => {
    let current = true;
    const check = () => {
      const hash = window.location.hash;
      if (!isPlanLinkFragment(hash)) return;
      void decodePlanLink(hash).then((outcome) => {
        if (!current) return;
        setState(outcome.ok ? { kind: 'ask', document: outcome.document } : { kind: 'bad', issues: outcome.issues });
      });
    };
    check();
    window.addEventListener('hashchange', check);
    return () => {
      current = false;
      window.removeEventListener('hashchange', check);
    };
  }, []);

  const close = () => {
    setState({ kind: 'none' });
    clearLinkFragment();
  };

  if (state.kind === 'none') return null;
  if (state.kind === 'bad') {
    return (
      <div className="cs-exchange-dialog" role="dialog" aria-label="Plan link refused" data-testid="link-refused">
        <PlanIssueList title="This link does not hold a plan that can be opened." issues={state.issues} />
        <button type="button" onClick={close}>
          Close
        </button>
      </div>
    );
  }
  const { document } = state;
  return (
    <div className="cs-exchange-dialog" role="dialog" aria-label="Open the plan from this link?" data-testid="link-prompt">
      <p>
        This link holds the plan <strong>“{document.main.name}”</strong> with {document.main.stages.length} stage{document.main.stages.length === 1 ? '' : 's'}
        {document.variants.length ? ` and ${document.variants.length} variant${document.variants.length === 1 ? '' : 's'}` : ''}.
      </p>
      <p>Opening it replaces the current plan “{currentName}” and its variants (Undo brings them back).</p>
      <div className="cs-exchange-actions">
        <button
          type="button"
          onClick={() => {
            commitDocument(document);
            close();
          }}
        >
          Open the linked plan
        </button>
        <button type="button" onClick={close}>
          Keep the current plan
        </button>
      </div>
    </div>
  );
}
