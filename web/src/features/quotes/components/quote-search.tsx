import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import InputAdornment from '@mui/material/InputAdornment';
import Skeleton from '@mui/material/Skeleton';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import Search from '@mui/icons-material/Search';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { isApiError } from '@/lib/api-client';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import type { QuoteSummary } from '@/types/api';
import { quotesQueryOptions } from '../api/get-quotes';
import { QuoteList } from './quote-list';

interface Props {
  initialQuery?: string;
  hrefFor: (quote: QuoteSummary) => string;
}

/** The front desk's quotes: every customer's, searchable by number, name, e-mail or rego. */
export function QuoteSearch({ initialQuery = '', hrefFor }: Props) {
  const [text, setText] = useState(initialQuery);
  const q = useDebouncedValue(text.trim());
  const quotes = useQuery(quotesQueryOptions(q ? { q } : {}));
  const items = quotes.data?.items ?? [];
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <TextField
        id="quote-search"
        label="Search quotes"
        type="search"
        value={text}
        margin="none"
        onChange={(event) => setText(event.target.value)}
        helperText="Quote number, customer name or e-mail, or rego."
        sx={{ maxWidth: 480 }}
        slotProps={{
          input: {
            startAdornment: (
              <InputAdornment position="start">
                <Search aria-hidden />
              </InputAdornment>
            ),
          },
        }}
      />
      <Typography role="status" variant="body2" color="text.secondary">
        {quotes.isSuccess
          ? `${items.length} quote${items.length === 1 ? '' : 's'}${q ? ` matching “${q}”` : ''}${items.length === 200 ? ' (the newest 200)' : ''}`
          : ''}
      </Typography>
      {quotes.isPending ? (
        <Box sx={{ display: 'grid', gap: 1.5 }}>
          <Skeleton variant="rounded" height={110} />
          <Skeleton variant="rounded" height={110} />
        </Box>
      ) : quotes.isError ? (
        <Alert severity="error">
          {isApiError(quotes.error) ? quotes.error.message : 'The quotes could not be loaded.'}
        </Alert>
      ) : items.length === 0 ? (
        <Typography color="text.secondary">No quotes found.</Typography>
      ) : (
        <QuoteList quotes={items} hrefFor={hrefFor} showCustomer aria-label="Quotes" />
      )}
    </Box>
  );
}
