import { PageTitle } from '../../components/ui/feedback';
import { categoriesQuery, useCategories } from '../../features/categories/api/get-categories';
import { CategoryTable } from '../../features/categories/components/category-table';
import { queryClient } from '../../lib/query-client';

export const loader = () => queryClient.ensureQueryData(categoriesQuery());

/** The item taxonomy: weights with their sources feed the statistics, skill and kit feed the matching. */
export function AdminCategoriesPage() {
  const { data: categories } = useCategories();
  return (
    <div>
      <PageTitle
        title="Item categories"
        lead="Average weights count towards “kilograms kept out of landfill” when an item is not weighed; keep the source beside each one."
      />
      <CategoryTable categories={categories} />
    </div>
  );
}
