import { TextLink } from '../../../components/ui/text-link';
import { paths } from '../../../config/paths';

/** The link that opens the new-make form with this pattern chosen (the pattern pages show it; the makes area owns starting a make). */
export function StartMakeLink({ pattern }: { pattern: { id: string; name: string } }) {
  return (
    <TextLink to={paths.makes.build({ newFromPattern: pattern.id })} aria-label={`Start a make from ${pattern.name}`}>
      Start a make
    </TextLink>
  );
}
