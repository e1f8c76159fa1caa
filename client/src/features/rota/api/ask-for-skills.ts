import { useMutation } from '@tanstack/react-query';
import type { Skill } from '../../../../../shared/constants';
import { api } from '../../../lib/api';

/** Mails the group's fixers with any of these skills; answers how many were asked. */
export const askForSkills = (eventId: number, skills: Skill[]) =>
  api<{ sent: number }>('POST', `/api/events/${eventId}/rota/ask`, { skills });

export const useAskForSkills = (eventId: number) =>
  useMutation({ mutationFn: (skills: Skill[]) => askForSkills(eventId, skills) });
