/** Every query key of the categories feature; invalidate by `categoryKeys.all`. */
export const categoryKeys = {
  all: ['categories'] as const,
  list: () => [...categoryKeys.all, 'list'] as const,
};
