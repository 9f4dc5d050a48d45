import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import ArrowForward from '@mui/icons-material/ArrowForward';
import PhoneOutlined from '@mui/icons-material/PhoneOutlined';
import PlaceOutlined from '@mui/icons-material/PlaceOutlined';
import { Link as RouterLink } from 'react-router';
import { DocumentTitle } from '@/components/ui/document-title';
import { paths } from '@/config/paths';
import { demoShop } from '@/config/shop';
import { useUser } from '@/features/auth/hooks/use-user';
import { tokens } from '@/theme/theme';

const steps = [
  {
    title: 'Plan',
    text: 'Tell us the vehicle and how you use it, then choose the lift, wheels and tyres.',
  },
  {
    title: 'Check',
    text: 'See whether the package fits, what it needs to stay legal, and what it costs.',
  },
  {
    title: 'Book',
    text: 'Pick a start time for the hoist and alignment bays and pay the deposit.',
  },
] as const;

export default function HomeRoute() {
  const { data: user } = useUser();
  return (
    <>
      <DocumentTitle title="Plan a lift, wheels and tyres" />
      <Box component="section" aria-labelledby="home-heading" sx={{ mb: { xs: 3, md: 5 } }}>
        <Typography variant="overline" component="p" sx={{ color: tokens.ochreDeep, mb: 0.5 }}>
          Suspension · Wheels · Tyres · Alignment
        </Typography>
        <Typography id="home-heading" variant="h1" sx={{ fontSize: { xs: '2rem', md: '2.6rem' } }}>
          Plan a lift that fits before you book the hoist
        </Typography>
        <Typography color="text.secondary" sx={{ mt: 1.5, fontSize: '1.1rem', maxWidth: 620 }}>
          Build the package on your phone, see the fit report and the price, and book the workshop
          time it needs.
        </Typography>
        <Box sx={{ display: 'flex', gap: 1.5, mt: 3, flexWrap: 'wrap' }}>
          <Button
            component={RouterLink}
            to={paths.plan.getHref()}
            variant="contained"
            color="secondary"
            size="large"
            endIcon={<ArrowForward />}
          >
            Start planning
          </Button>
          {user === null && (
            <Button
              component={RouterLink}
              to={paths.auth.register.getHref()}
              variant="outlined"
              size="large"
            >
              Create an account
            </Button>
          )}
        </Box>
      </Box>

      <Box
        sx={{
          display: 'grid',
          gap: { xs: 2.5, md: 3 },
          gridTemplateColumns: { xs: '1fr', md: '5fr 7fr' },
          alignItems: 'start',
        }}
      >
        <Card component="section" aria-labelledby="shop-heading">
          <Box sx={{ height: 6, bgcolor: 'primary.main' }} />
          <CardContent sx={{ p: { xs: 2.5, sm: 3 } }}>
            <Typography variant="overline" component="p" color="text.secondary">
              Your workshop
            </Typography>
            <Typography id="shop-heading" variant="h2" gutterBottom>
              {demoShop.name}
            </Typography>
            <Typography color="text.secondary" sx={{ mb: 2 }}>
              {demoShop.summary}
            </Typography>
            <Box sx={{ display: 'grid', gap: 1 }}>
              <Box sx={{ display: 'flex', gap: 1, alignItems: 'center' }}>
                <PlaceOutlined aria-hidden fontSize="small" color="primary" />
                <Typography>{demoShop.town}</Typography>
              </Box>
              <Box sx={{ display: 'flex', gap: 1, alignItems: 'center' }}>
                <PhoneOutlined aria-hidden fontSize="small" color="primary" />
                <Link href={demoShop.phoneHref} underline="hover">
                  {demoShop.phoneDisplay}
                </Link>
              </Box>
            </Box>
          </CardContent>
        </Card>

        <Box component="section" aria-labelledby="steps-heading">
          <Typography id="steps-heading" variant="h2" sx={{ mb: 1.5 }}>
            How it works
          </Typography>
          <Box component="ol" sx={{ listStyle: 'none', p: 0, m: 0, display: 'grid', gap: 1.5 }}>
            {steps.map((step, index) => (
              <Box
                component="li"
                key={step.title}
                sx={{ display: 'flex', gap: 2, alignItems: 'flex-start' }}
              >
                <Box
                  aria-hidden
                  sx={{
                    flexShrink: 0,
                    width: 36,
                    height: 36,
                    borderRadius: '50%',
                    display: 'grid',
                    placeItems: 'center',
                    bgcolor: tokens.eucalyptusMist,
                    color: tokens.eucalyptusDeep,
                    fontWeight: 700,
                  }}
                >
                  {index + 1}
                </Box>
                <Box>
                  <Typography variant="h3" component="h3">
                    {step.title}
                  </Typography>
                  <Typography color="text.secondary">{step.text}</Typography>
                </Box>
              </Box>
            ))}
          </Box>
        </Box>
      </Box>
    </>
  );
}
