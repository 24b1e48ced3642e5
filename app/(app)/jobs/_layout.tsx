import { Slot } from 'expo-router';

/** Jobs: the list, a job, a new job and a record share one section of the navigation. */
export default function JobsLayout() {
  return <Slot />;
}
