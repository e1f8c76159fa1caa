/** Every query key of the bookings feature; invalidate by `bookingKeys.all`. */
export const bookingKeys = {
  all: ['bookings'] as const,
  detail: (reference: string) => [...bookingKeys.all, 'detail', reference] as const,
  code: (reference: string) => [...bookingKeys.all, 'code', reference] as const,
  offer: (token: string) => [...bookingKeys.all, 'offer', token] as const,
  rebook: (token: string) => [...bookingKeys.all, 'rebook', token] as const,
};
