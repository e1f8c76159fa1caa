import { PageTitle } from '../../components/ui/feedback';
import { categoriesQuery, useCategories } from '../../features/categories/api/get-categories';
import { CategoryTable } from '../../features/categories/components/category-table';
import { queryClient } from '../../lib/query-client';
import { useT } from '../../lib/i18n';

export const loader = () => queryClient.ensureQueryData(categoriesQuery());

/** The item taxonomy: weights with their sources feed the statistics, skill and kit feed the matching. */
export function AdminCategoriesPage() {
  const t = useT();
  const { data: categories } = useCategories();
  return (
    <div>
      <PageTitle title={t('admin.categories.title')} lead={t('admin.categories.lead')} />
      <CategoryTable categories={categories} />
    </div>
  );
}
