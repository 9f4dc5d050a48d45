import LinearProgress from '@mui/material/LinearProgress';
import { useNavigation } from 'react-router';

/** A thin bar under the app bar while the next page (its code or data) is loading. */
export function NavigationProgress() {
  const navigation = useNavigation();
  if (navigation.state !== 'loading') return null;
  return (
    <LinearProgress
      color="secondary"
      aria-label="Loading the page"
      sx={{ position: 'absolute', left: 0, right: 0, bottom: -3, height: 3 }}
    />
  );
}
