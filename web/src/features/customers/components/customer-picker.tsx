import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import InputAdornment from '@mui/material/InputAdornment';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import Search from '@mui/icons-material/Search';
import { useQuery } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { isApiError } from '@/lib/api-client';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import type { Customer } from '@/types/api';
import { customersQueryOptions } from '../api/search-customers';
import { NewCustomerForm } from '../forms/new-customer-form';

const MIN_SEARCH_LENGTH = 2;

/** Finds a customer by name or e-mail, or adds a new one, for a walk-in quote. */
export function CustomerPicker({ onChoose }: { onChoose: (customer: Customer) => void }) {
  const [text, setText] = useState('');
  const q = useDebouncedValue(text.trim());
  const searching = q.length >= MIN_SEARCH_LENGTH;
  const customers = useQuery({ ...customersQueryOptions(q), enabled: searching });
  const [adding, setAdding] = useState(false);
  const resultsHeadingId = useId();
  const newHeadingId = useId();
  const items = searching ? (customers.data?.items ?? []) : [];

  return (
    <Box
      sx={{
        display: 'grid',
        gap: 3,
        gridTemplateColumns: { xs: 'minmax(0, 1fr)', md: 'minmax(0, 3fr) minmax(0, 2fr)' },
        alignItems: 'start',
      }}
    >
      <Box component="section" aria-labelledby={resultsHeadingId}>
        <Typography id={resultsHeadingId} variant="h2" sx={{ mb: 1 }}>
          Find the customer
        </Typography>
        <TextField
          id="customer-search"
          label="Name or e-mail"
          type="search"
          value={text}
          margin="none"
          onChange={(event) => setText(event.target.value)}
          helperText={`Type at least ${MIN_SEARCH_LENGTH} letters.`}
          slotProps={{
            input: {
              startAdornment: (
                <InputAdornment position="start">
                  <Search aria-hidden />
                </InputAdornment>
              ),
            },
            htmlInput: { autoComplete: 'off' },
          }}
        />
        <Typography role="status" variant="body2" color="text.secondary" sx={{ mt: 1.5 }}>
          {searching && customers.isSuccess
            ? items.length === 0
              ? `No customer matches “${q}”.`
              : `${items.length} customer${items.length === 1 ? '' : 's'} found.`
            : ''}
        </Typography>
        {customers.isError && (
          <Alert severity="error" sx={{ mt: 1 }}>
            {isApiError(customers.error) ? customers.error.message : 'The search did not work.'}
          </Alert>
        )}
        {items.length > 0 && (
          <List aria-label="Customers found" sx={{ mt: 1, display: 'grid', gap: 1, p: 0 }}>
            {items.map((customer) => (
              <ListItem
                key={customer.id}
                sx={{
                  border: 1,
                  borderColor: 'divider',
                  borderRadius: 2,
                  bgcolor: 'background.paper',
                }}
                secondaryAction={
                  <Button
                    variant="outlined"
                    size="small"
                    onClick={() => onChoose(customer)}
                    aria-label={`Quote for ${customer.name}`}
                  >
                    Choose
                  </Button>
                }
              >
                <ListItemText
                  primary={customer.name}
                  secondary={customer.email}
                  sx={{ pr: 10, '& .MuiListItemText-secondary': { wordBreak: 'break-all' } }}
                />
              </ListItem>
            ))}
          </List>
        )}
      </Box>

      <Card component="section" aria-labelledby={newHeadingId}>
        <CardContent>
          <Typography id={newHeadingId} variant="h2" sx={{ mb: 0.5 }}>
            New customer
          </Typography>
          {adding ? (
            <NewCustomerForm
              formLabelId={newHeadingId}
              initialName={text.includes('@') ? '' : text.trim()}
              onCreated={onChoose}
            />
          ) : (
            <>
              <Typography color="text.secondary" sx={{ mb: 2 }}>
                Not in the list? Add them with their name and e-mail address.
              </Typography>
              <Button variant="contained" onClick={() => setAdding(true)}>
                Add a new customer
              </Button>
            </>
          )}
        </CardContent>
      </Card>
    </Box>
  );
}
