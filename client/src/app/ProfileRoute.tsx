import { useParams } from 'react-router-dom';
import { useProfile } from '../features/profiles/api';
import { ProfilePage } from '../features/profiles/ProfilePages';
import { SpeciesCardSection } from '../features/species-cards/SpeciesCardSection';
import { useCurrentWorkspace } from '../shared/lib/currentWorkspace';

/*
 * A species profile's page with its species card below: the profile comes from the
 * profiles feature, the card from the species-cards feature. The card shows once the
 * profile has loaded (the same cached request the profile page makes), so a missing
 * profile shows only its own "not found".
 */
export function ProfileRoute() {
  const { profileId = '' } = useParams();
  const workspace = useCurrentWorkspace();
  const profile = useProfile(workspace.id, profileId);
  return (
    <div className="flex flex-col gap-8">
      <ProfilePage />
      {profile.data ? (
        <SpeciesCardSection
          workspaceId={workspace.id}
          profileId={profile.data.id}
          profileName={profile.data.name}
          canEdit={workspace.role !== 'viewer'}
        />
      ) : null}
    </div>
  );
}
