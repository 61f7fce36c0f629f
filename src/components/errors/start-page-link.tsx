import { Link } from 'react-router';
import { paths } from '../../config/paths';
import { buttonClasses } from '../ui/button';

/** The way out of a screen that cannot be shown. */
export function StartPageLink() {
  return (
    <Link to={paths.home.to()} className={buttonClasses('primary')}>
      Go to the start page
    </Link>
  );
}
