// A link that downloads a Lobewright bundle (the browser saves the JSON file itself).
import { buttonClasses } from '../../../components/ui/button';

export function BundleDownloadLink({
  href,
  children = 'Download bundle',
}: {
  href: string;
  children?: string;
}) {
  return (
    <a href={href} download className={buttonClasses('secondary', 'sm')}>
      {children}
    </a>
  );
}
