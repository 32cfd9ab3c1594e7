import { Select } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useLocation, useMatch, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSession } from '@/lib/session';
import { workshopQueries } from '../api/queries';

const ALL_WORKSHOPS = '__all__';

/**
 * The header's workshop picker. Switching keeps the page (members of one workshop → members of the
 * other) where that makes sense, else opens the workshop's overview.
 */
export function WorkshopSwitcher() {
  const { user } = useSession();
  const navigate = useNavigate();
  const location = useLocation();
  const match = useMatch('/workshops/:workshopId/*');
  const workshops = useQuery({ ...workshopQueries.mine(), enabled: user !== null });
  if (!user || !workshops.data) return null;

  const currentId = match?.params.workshopId;
  const current = workshops.data.some((workshop) => workshop.id === currentId) ? currentId : null;

  const handleChange = (value: string | null) => {
    if (!value || value === current) return;
    if (value === ALL_WORKSHOPS) return navigate(paths.workshops);
    const rest = current ? location.pathname.slice(`/workshops/${current}`.length) : '';
    // Pages about one build or part belong to the old workshop; keep only the section.
    const section = /^\/(members|settings|builds|parts|fit-reports)$/.exec(rest)?.[0] ?? '';
    navigate(`${paths.workshop.to(value)}${section}`);
  };

  return (
    <Select
      aria-label="Workshop"
      placeholder={workshops.data.length ? 'Choose a workshop' : 'No workshop yet'}
      size="sm"
      w={{ base: 160, sm: 240 }}
      value={current}
      onChange={handleChange}
      allowDeselect={false}
      comboboxProps={{ withinPortal: true }}
      data={[
        ...workshops.data.map((workshop) => ({ value: workshop.id, label: workshop.name })),
        { value: ALL_WORKSHOPS, label: 'All my workshops…' },
      ]}
    />
  );
}
