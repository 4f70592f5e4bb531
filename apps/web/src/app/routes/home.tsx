// /: the home screen for the signed-in role.
import { RoleHome, type HomeArea } from '../../features/home/components/role-home';
import { useMe } from '../../lib/auth';
import { useDocumentTitle } from '../../lib/document-title';
import { areaLabel, areasFor } from '../areas';

export function HomeRoute() {
  useDocumentTitle('Home');
  const me = useMe();
  const homeAreas: HomeArea[] = areasFor(me.role)
    .filter((area) => area.id !== 'home')
    .map((area) => ({
      id: area.id,
      path: area.path,
      label: areaLabel(area, me.role),
      summary: area.summary[me.role] ?? '',
      comingWith: area.comingWith,
    }));
  return <RoleHome me={me} areas={homeAreas} />;
}
