/** A section as the frame editor offers it (no server code here, so client components may import it). */
export type FrameSectionOption = {
  id: number;
  name: string;
  thickness: number;
  width: number;
  active: boolean;
};
