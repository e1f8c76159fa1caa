import { useState } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { formatDay } from '../../../../shared/format';
import { Button } from '../../components/ui/button';
import { EmptyState, PageTitle } from '../../components/ui/feedback';
import { SelectField, TextField } from '../../components/ui/field';
import { categoriesQuery, useCategories } from '../../features/categories/api/get-categories';
import type { KnowledgeQuery } from '../../../../shared/api/toolkit';
import type { KnowledgeEntry } from '../../features/toolkit/api/types';
import { knowledgeQuery, useKnowledge } from '../../features/toolkit/api/get-knowledge';
import { queryClient } from '../../lib/query-client';
import { KnowledgeCard } from '../../features/toolkit/components/knowledge-card';
import { useLanguage, useT } from '../../lib/i18n';

/** The search as the address says it; nothing is searched until something is asked. */
const searchOf = (params: URLSearchParams) => {
  const applied = {
    q: params.get('q') ?? '',
    categoryId: Number(params.get('categoryId')) || undefined,
    brand: params.get('brand') ?? '',
    model: params.get('model') ?? '',
    scope: (params.get('scope') === 'mine' ? 'mine' : 'network') as 'mine' | 'network',
  };
  return { applied, searched: Boolean(applied.q || applied.categoryId || applied.brand || applied.model) };
};

/** The page reads what the loader fetched; a failure to fetch it is the route's error, shown in the page frame. */
export const loader = ({ request }: LoaderFunctionArgs) => {
  const { applied, searched } = searchOf(new URL(request.url).searchParams);
  return Promise.all([
    queryClient.ensureQueryData(categoriesQuery()),
    searched ? queryClient.ensureQueryData(knowledgeQuery(applied)) : null,
  ]);
};

/** /toolkit/knowledge: what the groups have learned, searchable by kind, brand, model and the words of the fault. */
export function KnowledgePage() {
  const t = useT();
  const [params, setParams] = useSearchParams();
  const { data: categories } = useCategories();
  const { applied, searched } = searchOf(params);
  const [draft, setDraft] = useState(applied);
  return (
    <div className="mx-auto max-w-3xl space-y-5">
      <PageTitle title={t('bench.page.notes')} lead={t('bench.tool.knowledge.lead')} />
      <form
        role="search"
        className="space-y-3 rounded-xl bg-white p-4 ring-1 ring-ink/5"
        onSubmit={(e) => {
          e.preventDefault();
          const next = new URLSearchParams();
          for (const [k, v] of Object.entries(draft))
            if (v && !(k === 'scope' && v === 'network')) next.set(k, String(v));
          setParams(next);
        }}
      >
        <TextField
          label={t('bench.tool.knowledge.words')}
          value={draft.q}
          onChange={(e) => setDraft({ ...draft, q: e.target.value })}
          placeholder={t('bench.tool.knowledge.wordsPlaceholder')}
          autoFocus
        />
        <div className="grid gap-3 sm:grid-cols-3">
          <SelectField
            label={t('bench.tool.knowledge.kind')}
            value={draft.categoryId ?? ''}
            onChange={(e) => setDraft({ ...draft, categoryId: Number(e.target.value) || undefined })}
          >
            <option value="">{t('bench.tool.knowledge.any')}</option>
            {categories.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </SelectField>
          <TextField
            label={t('bench.tool.knowledge.brand')}
            value={draft.brand}
            onChange={(e) => setDraft({ ...draft, brand: e.target.value })}
          />
          <TextField
            label={t('bench.tool.knowledge.model')}
            value={draft.model}
            onChange={(e) => setDraft({ ...draft, model: e.target.value })}
          />
        </div>
        <div className="flex flex-wrap items-center gap-3">
          <label className="flex items-center gap-2 text-sm">
            <input
              type="checkbox"
              className="size-5 accent-copper"
              checked={draft.scope === 'mine'}
              onChange={(e) => setDraft({ ...draft, scope: e.target.checked ? 'mine' : 'network' })}
            />
            {t('bench.tool.knowledge.mine')}
          </label>
          <Button type="submit" className="ml-auto">
            {t('bench.tool.search')}
          </Button>
        </div>
      </form>
      {!searched ? (
        <EmptyState title={t('bench.tool.knowledge.emptyTitle')} icon="⌕">
          {t('bench.tool.knowledge.empty')}
        </EmptyState>
      ) : (
        <KnowledgeResults search={applied} />
      )}
    </div>
  );
}

/** The notes the route's loader found for the search in the address, closest first. */
function KnowledgeResults({ search }: { search: KnowledgeQuery }) {
  const t = useT();
  const lang = useLanguage();
  const { data: results } = useKnowledge(search);
  if (results.length === 0)
    return (
      <EmptyState title={t('bench.tool.knowledge.noneTitle')} icon="○">
        {t('bench.tool.knowledge.none')}
      </EmptyState>
    );
  return (
    <>
      <p className="text-sm text-ink-soft" role="status">
        {results.length === 30 ? t('bench.tool.knowledge.max') : t('bench.tool.knowledge.count', { n: results.length })}
      </p>
      <ol className="space-y-3" aria-label={t('bench.tool.knowledge.results')}>
        {results.map((e: KnowledgeEntry) => (
          <li key={e.itemId}>
            <KnowledgeCard entry={e} when={formatDay(e.eventDate, 'Europe/London', lang)} />
          </li>
        ))}
      </ol>
    </>
  );
}
