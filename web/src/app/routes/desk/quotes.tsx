import Button from '@mui/material/Button';
import { Link as RouterLink, useSearchParams } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { QuoteSearch } from '@/features/quotes/components/quote-search';

export default function DeskQuotesRoute() {
  const [searchParams] = useSearchParams();
  return (
    <>
      <PageHeader
        title="Quotes"
        lead="Every customer's quotes, newest first."
        actions={
          <Button component={RouterLink} to={paths.desk.walkIn.getHref()} variant="contained">
            New walk-in quote
          </Button>
        }
      />
      <QuoteSearch
        initialQuery={searchParams.get('q') ?? ''}
        hrefFor={(quote) => paths.desk.quote.getHref(quote.id)}
      />
    </>
  );
}
