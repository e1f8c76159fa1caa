import { useEffect } from 'react';
import { useLocation, useNavigate } from 'react-router';

/**
 * The token of a booking's manage link. Mailed links carry it in the fragment (#token=), which the browser never
 * sends. Links mailed before carry ?token=: it is read, then moved into the fragment by replacing the history entry,
 * so it leaves the address bar, the history and the Referer of later requests. The API gets it in a header.
 */
export function useManageToken(): string {
  const { pathname, search, hash, state } = useLocation();
  const navigate = useNavigate();
  const fromHash = new URLSearchParams(hash.replace(/^#/, '')).get('token');
  const fromQuery = new URLSearchParams(search).get('token');
  const token = fromHash || fromQuery || '';
  useEffect(() => {
    if (!fromQuery) return;
    const rest = new URLSearchParams(search);
    rest.delete('token');
    const kept = rest.toString();
    navigate(
      { pathname, search: kept ? `?${kept}` : '', hash: `token=${encodeURIComponent(token)}` },
      { replace: true, state },
    );
  }, [fromQuery, token, pathname, search, state, navigate]);
  return token;
}
