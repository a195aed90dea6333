import type { ReactNode } from 'react';
import { FormAlert } from '../../../components/ui/form-alert';
import { LoadingState } from '../../../components/ui/loading-state';
import { Panel } from '../../../components/ui/panel';
import type { Role } from '../../../types/api';
import { usePatterns } from '../api/get-patterns';
import type { PatternScope } from '../query-keys';
import type { PatternSummary } from '../types';
import { PatternCard } from './pattern-card';

const PUBLISHERS: readonly Role[] = ['coach', 'admin'];

const sectionText: Record<PatternScope, { title: string; description: string; empty: string }> = {
  mine: {
    title: 'Your patterns',
    description: 'Patterns you uploaded. Only you see them until a coach publishes their own to the shared library.',
    empty: 'No patterns yet. Upload an SVG, DXF or Blockwright JSON file to start.',
  },
  library: {
    title: 'Shared library',
    description: 'Patterns coaches have published for everyone here.',
    empty: 'Nothing has been published to the shared library yet.',
  },
};

function PatternSection({
  scope,
  me,
  reviewHref,
  startMake,
}: {
  scope: PatternScope;
  me: { id: string; role: Role };
  reviewHref: (id: string) => string;
  startMake?: (pattern: PatternSummary) => ReactNode;
}) {
  const patterns = usePatterns(scope);
  const text = sectionText[scope];
  return (
    <Panel title={text.title} description={text.description}>
      {patterns.isPending ? (
        <LoadingState label="Loading patterns…" />
      ) : patterns.isError ? (
        <FormAlert>{patterns.error.message}</FormAlert>
      ) : patterns.data.length === 0 ? (
        <p className="text-ink-700">{text.empty}</p>
      ) : (
        <ul className="grid gap-4 md:grid-cols-2" aria-label={text.title}>
          {patterns.data.map((pattern) => (
            <PatternCard
              key={pattern.id}
              pattern={pattern}
              isOwner={pattern.owner.id === me.id}
              canPublish={PUBLISHERS.includes(me.role)}
              reviewHref={reviewHref(pattern.id)}
              startMake={startMake?.(pattern)}
            />
          ))}
        </ul>
      )}
    </Panel>
  );
}

/**
 * The pattern lists: "Your patterns" and the "Shared library" (published by coaches), each
 * shown when named in `sections`. The route supplies the links: the review page and, through
 * `startMake`, a way into the makes area.
 */
export function PatternLibrary({
  sections,
  me,
  reviewHref,
  startMake,
}: {
  sections: readonly PatternScope[];
  me: { id: string; role: Role };
  reviewHref: (id: string) => string;
  startMake?: (pattern: PatternSummary) => ReactNode;
}) {
  return (
    <div className="flex flex-col gap-6">
      {sections.map((scope) => (
        <PatternSection key={scope} scope={scope} me={me} reviewHref={reviewHref} {...(startMake ? { startMake } : {})} />
      ))}
    </div>
  );
}
