/** Minimum touch target (CSS px) for every control: gloved thumbs on a driveway (Material's 48 dp). Kept free of imports so tests can read it. */
export const MIN_TARGET_PX = 48;
