// The invented demo: a berry farm and the people around it. Every name is made up;
// e-mail addresses use the reserved .example domain (RFC 2606).
import type { Role } from '../../../shared/api/auth';

export const DEMO_PASSWORD = 'seedwake-demo-2026';

export const demoWorkspace = { id: '5eedfa00-0000-4000-8000-000000000001', name: 'Alder Creek Berry Farm' };

export const demoPeople: { id: string; email: string; name: string; role: Role; who: string }[] = [
  {
    id: '5eedfa00-0000-4000-8000-0000000000a1',
    email: 'owner@alder-creek.example',
    name: 'Hollis Varga',
    role: 'owner',
    who: 'workspace owner',
  },
  {
    id: '5eedfa00-0000-4000-8000-0000000000a2',
    email: 'consultant@alder-creek.example',
    name: 'Priya Oakes',
    role: 'editor',
    who: 'crop consultant',
  },
  {
    id: '5eedfa00-0000-4000-8000-0000000000a3',
    email: 'analyst@alder-creek.example',
    name: 'Jun Carrow',
    role: 'editor',
    who: 'analyst',
  },
  {
    id: '5eedfa00-0000-4000-8000-0000000000a4',
    email: 'teacher@alder-creek.example',
    name: 'Ines Fallow',
    role: 'editor',
    who: 'extension educator',
  },
  {
    id: '5eedfa00-0000-4000-8000-0000000000a5',
    email: 'grower@alder-creek.example',
    name: 'Dale Merrow',
    role: 'viewer',
    who: 'grower',
  },
];
