import { Layer, Source, type LayerProps } from "react-map-gl/maplibre";
import { fabricSources, type FabricLook } from "./fabric-style";
import type { MapLayerInfo } from "./project-map";

/** The project's parcel and building layers (see `fabricSources`), kept in step with the toggles and colouring. */
export function FabricLayers({ layers, ...look }: { layers: MapLayerInfo[] } & FabricLook) {
  return (
    <>
      {fabricSources(layers, look).map((f) => (
        <Source key={f.id} id={f.id} {...f.source}>
          {f.layers.map((spec) => {
            const { source: _, ...props } = spec as LayerProps & { source?: string };
            return <Layer key={spec.id} {...(props as LayerProps)} />;
          })}
        </Source>
      ))}
    </>
  );
}
