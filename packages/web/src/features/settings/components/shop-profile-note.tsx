import { Link, Text } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router';
import { paths } from '../../../config/paths';
import type { ShopProfile } from '../api/shop-profile';

type Units = 'mm' | 'in';

/** Says whose shop a cut list is worked out for, with the way to change it. */
export function ShopProfileNote({
  profile,
  signedIn,
  units,
  formatLength,
}: {
  profile: ShopProfile | undefined;
  signedIn: boolean;
  units: Units;
  formatLength: (mm: number, units: Units) => string;
}) {
  const settingsLink = (text: string) => (
    <Link asChild color="steel.700" textDecoration="underline">
      <RouterLink to={paths.settings.getHref()}>{text}</RouterLink>
    </Link>
  );
  if (!signedIn)
    return (
      <Text fontSize="sm" color="fg.muted">
        Signed-in members see this worked out for their own shop: their kerf, sheet and bar sizes, and prices.
      </Text>
    );
  if (!profile?.saved)
    return (
      <Text fontSize="sm" color="fg.muted">
        These are the usual values. {settingsLink('Set up your shop profile')} for your own kerf, sheet sizes and
        prices.
      </Text>
    );
  const sheets = profile.sheets
    .map((sheet) => `${formatLength(sheet.length, units)} × ${formatLength(sheet.width, units)}`)
    .join(', ');
  return (
    <Text fontSize="sm" color="fg.muted">
      Worked out for your shop: {formatLength(profile.kerf, units)} kerf, sheets of {sheets}
      {profile.prices.length > 0 ? `, prices in ${profile.currency}` : ', no prices yet'}.{' '}
      {settingsLink('Change your shop profile')}
    </Text>
  );
}
