import { useNavigate } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { CustomerPicker } from '@/features/customers/components/customer-picker';
import { firstOpenStep } from '@/features/planner/forms/build';
import { usePlanner } from '@/features/planner/hooks/use-planner';

/** First step of a walk-in quote: who it is for. */
export default function WalkInCustomerRoute() {
  const { build, setCustomer, stepHref } = usePlanner();
  const navigate = useNavigate();
  return (
    <>
      <PageHeader
        title="Walk-in quote"
        lead={
          build.customer
            ? `Quoting for ${build.customer.name}. Choose someone else, or go on with the build.`
            : 'Find the customer, or add them, then plan the build with them.'
        }
      />
      <CustomerPicker
        onChoose={(customer) => {
          setCustomer({ id: customer.id, name: customer.name, email: customer.email });
          void navigate(stepHref(firstOpenStep(build)));
        }}
      />
    </>
  );
}
