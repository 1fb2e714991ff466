import type { MetadataRoute } from "next";

// The installable app: opens on the signed-in person's own home, full screen, in our colours.
export default function manifest(): MetadataRoute.Manifest {
  return {
    name: "Plumbline — scrutineering and run groups",
    short_name: "Plumbline",
    description:
      "The tech line, class checks and run sheet for club time-attack days, offline on the pad.",
    start_url: "/home",
    scope: "/",
    display: "standalone",
    orientation: "portrait",
    background_color: "#f7f6f2",
    theme_color: "#101214",
    icons: [
      { src: "/icons/icon-192.png", sizes: "192x192", type: "image/png", purpose: "any" },
      { src: "/icons/icon-512.png", sizes: "512x512", type: "image/png", purpose: "any" },
      {
        src: "/icons/icon-maskable-512.png",
        sizes: "512x512",
        type: "image/png",
        purpose: "maskable",
      },
    ],
  };
}
