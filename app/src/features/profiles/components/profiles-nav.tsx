import { Tab, TabList } from '@fluentui/react-components';
import { useLocation, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';

export type ProfilesSection = 'library' | 'build' | 'upload' | 'invert' | 'compare';

const SECTIONS: { key: ProfilesSection; label: string; href: string; writes: boolean }[] = [
  { key: 'library', label: 'Library', href: paths.profiles.getHref(), writes: false },
  { key: 'build', label: 'Build from layers', href: paths.profileBuild.getHref(), writes: true },
  { key: 'upload', label: 'Upload', href: paths.profileUpload.getHref(), writes: true },
  { key: 'invert', label: 'Invert a trace', href: paths.profileInvert.getHref(), writes: true },
  { key: 'compare', label: 'Compare', href: paths.profileCompare.getHref(), writes: false },
];

function currentSection(pathname: string): ProfilesSection | undefined {
  return (
    SECTIONS.find((s) => s.key !== 'library' && pathname.startsWith(s.href))?.key ??
    (pathname === paths.profiles.getHref() ? 'library' : undefined)
  );
}

/** The Profiles area's own sections; the ones that write are shown only to who may write. */
export function ProfilesNav({ canWrite }: { canWrite: boolean }) {
  const navigate = useNavigate();
  const { pathname } = useLocation();
  return (
    <TabList
      aria-label="Profile tools"
      selectedValue={currentSection(pathname) ?? null}
      onTabSelect={(_, data) => {
        const section = SECTIONS.find((s) => s.key === data.value);
        if (section) navigate(section.href);
      }}
      style={{ marginBottom: 16, flexWrap: 'wrap' }}
    >
      {SECTIONS.filter((s) => canWrite || !s.writes).map((s) => (
        <Tab key={s.key} value={s.key}>
          {s.label}
        </Tab>
      ))}
    </TabList>
  );
}
