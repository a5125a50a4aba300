package org.bracewalk.ui.common;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import javafx.scene.canvas.Canvas;
import javafx.scene.image.PixelReader;
import javafx.scene.image.WritableImage;
import org.bracewalk.bench.HeadlessFx;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/**
 * Frame members in every state, the selected side and the marked joints are told apart in grey
 * alone (the pictures are converted to luminance before they are compared), so no state rests on
 * colour. The pictures are kept in {@code target/frame-drawing} for a person to look at.
 */
class FrameDrawingTest {
  private static final PlaneGrid GRID = PlaneGrid.uniform(1, 1, Support.PINNED_BASE);
  private static final FrameRef TOP = FrameRef.ledger(1, 1);

  @Test
  void everyFrameLookDrawsItsMemberDifferentlyInGrey() throws Exception {
    HeadlessFx.start();
    Map<FrameLook, int[]> profiles = HeadlessFx.onFx(() -> {
      Map<FrameLook, int[]> out = new EnumMap<>(FrameLook.class);
      for (FrameLook look : FrameLook.values()) {
        out.put(look, greyAround(render(pictureOf(look), "look-" + look.name().toLowerCase()), TOP));
      }
      return out;
    });
    List<FrameLook> looks = List.of(FrameLook.values());
    for (int a = 0; a < looks.size(); a++) {
      for (int b = a + 1; b < looks.size(); b++) {
        assertThat(distance(profiles.get(looks.get(a)), profiles.get(looks.get(b))))
            .as("%s and %s in grey", looks.get(a), looks.get(b))
            .isGreaterThan(20 * 255);
      }
    }
  }

  @Test
  void aMissingMemberLeavesPaperWhereItsBarWasAndAPlainOneDoesNot() {
    HeadlessFx.start();
    int[] middle = HeadlessFx.onFx(() -> {
      int[] lum = new int[2];
      int k = 0;
      for (FrameLook look : new FrameLook[] {FrameLook.AS_DESIGNED, FrameLook.OMITTED}) {
        Canvas c = render(pictureOf(look), "middle-" + look.name().toLowerCase());
        PlaneGeometry geo = new PlaneGeometry(GRID, W, H, 52, 30);
        double[] s = geo.frame(TOP);
        // a quarter of the way along: past the end ticks of an omitted member, off its dashes' pitch
        int x = (int) Math.round(s[0] + (s[2] - s[0]) * 0.3);
        lum[k++] = luminance(c.snapshot(null, null).getPixelReader().getArgb(x, (int) Math.round(s[1])));
      }
      return lum;
    });
    assertThat(middle[0]).as("plain bar: dark").isLessThan(120);
    assertThat(middle[1]).as("left out: paper").isGreaterThan(200);
  }

  @Test
  void theSelectedSideAndEachMarkedJointChangeThePictureInGrey() {
    HeadlessFx.start();
    int[] diffs = HeadlessFx.onFx(() -> {
      PlaneGrid g = PlaneGrid.uniform(2, 2, Support.PINNED_BASE);
      PlaneDesign d = PlaneDesign.of(g, Map.of(PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING)));
      PanelRef cur = PanelRef.of(1, 1);
      PlanePicture plain = new PlanePicture(d, Map.of(), true, List.of(), Set.of(), List.of(), Set.of(), cur);
      PlanePicture side = new PlanePicture(d, Map.of(), true, List.of(), Set.of(), List.of(), Set.of(), cur, Map.of(),
          FrameRef.standard(1, 1), List.of());
      Joint j = new Joint(1, 0);
      PlanePicture lost = new PlanePicture(d, Map.of(), true, List.of(), Set.of(), List.of(), Set.of(), null, Map.of(),
          null, List.of(new Freedom(FreedomKind.LOST_RESTRAINT, 1, List.of(j),
              List.of(FrameRef.standard(1, 0), FrameRef.standard(2, 0)), List.of())));
      PlanePicture loose = new PlanePicture(d, Map.of(), true, List.of(), Set.of(), List.of(), Set.of(), null, Map.of(),
          null, List.of(new Freedom(FreedomKind.LOOSE_END, 1, List.of(j), List.of(FrameRef.ledger(1, 1)), List.of())));
      PlanePicture none = new PlanePicture(d, Map.of(), true, List.of(), Set.of(), List.of(), Set.of(), null);
      PlaneGeometry geo = new PlaneGeometry(g, W, H, 52, 30);
      int[] near = {(int) geo.lineX(1), (int) geo.levelY(1), (int) geo.lineX(1), (int) geo.levelY(0)};
      int sideDiff = regionDiff(render(plain, "cursor-panel"), render(side, "cursor-side"), near, 10);
      int[] at = {(int) geo.lineX(0), (int) geo.levelY(1), (int) geo.lineX(0), (int) geo.levelY(1)};
      Canvas noneC = render(none, "joint-none");
      Canvas lostC = render(lost, "joint-lost-restraint");
      Canvas looseC = render(loose, "joint-loose-end");
      return new int[] {sideDiff, regionDiff(noneC, lostC, at, 16), regionDiff(noneC, looseC, at, 16),
          regionDiff(lostC, looseC, at, 16)};
    });
    assertThat(diffs[0]).as("selected standard against the panel cursor").isGreaterThan(30);
    assertThat(diffs[1]).as("lost restraint marked").isGreaterThan(30);
    assertThat(diffs[2]).as("loose end marked").isGreaterThan(30);
    assertThat(diffs[3]).as("lost restraint and loose end differ").isGreaterThan(30);
  }

  @Test
  void withoutBlocksTheJointsOfASwayingPartHatchTheirPanels() {
    PlaneGrid g = PlaneGrid.uniform(4, 1, Support.PINNED_BASE);
    List<Joint> moving = new ArrayList<>();
    for (int level = 2; level <= 4; level++) {
      moving.add(new Joint(level, 0));
      moving.add(new Joint(level, 1));
    }
    PlanePicture p = new PlanePicture(PlaneDesign.of(g, Map.of()), Map.of(), true, List.of(), Set.of(), List.of(),
        Set.of(), null, Map.of(), null, List.of(new Freedom(FreedomKind.SWAY, 2, moving, List.of(), List.of())));
    // analysis.md, example I: lifts 2-4 sway when both standards of lift 2 are gone
    assertThat(p.sway().shearing()).containsExactly(PanelRef.of(2, 1), PanelRef.of(3, 1), PanelRef.of(4, 1));
  }

  // ---- helpers ---------------------------------------------------------------------------------

  private static final double W = 360;
  private static final double H = 260;

  private static PlanePicture pictureOf(FrameLook look) {
    PanelState state = switch (look) {
      case AS_DESIGNED, OMITTED -> null;
      case SOUND -> PanelState.SOUND;
      case DAMAGED_EFFECTIVE -> PanelState.DAMAGED_EFFECTIVE;
      case DAMAGED_INEFFECTIVE -> PanelState.DAMAGED_INEFFECTIVE;
      case MISSING -> PanelState.MISSING;
      case EXTRA -> PanelState.EXTRA;
      case NOT_INSPECTED -> PanelState.NOT_INSPECTED;
      case NOT_REACHABLE -> PanelState.NOT_REACHABLE;
    };
    boolean inDesign = look != FrameLook.OMITTED && look != FrameLook.EXTRA;
    PlaneDesign d = new PlaneDesign(GRID, Map.of(), Set.of(), inDesign ? Set.of() : Set.of(TOP));
    Map<FrameRef, PanelState> found = new HashMap<>();
    if (state != null) {
      found.put(TOP, state);
    }
    PlanePicture p = new PlanePicture(d, Map.<PanelRef, PanelFinding>of(), true, List.of(), Set.of(), List.of(),
        Set.of(), null, found, null, List.of());
    assertThat(p.frameLook(TOP)).isEqualTo(look);
    return p;
  }

  private static Canvas render(PlanePicture p, String name) {
    Canvas c = new Canvas(W, H);
    PlanePainter.paint(c.getGraphicsContext2D(), p, W, H);
    WritableImage img = c.snapshot(null, null);
    try {
      Path dir = Path.of("target", "frame-drawing");
      Files.createDirectories(dir);
      javax.imageio.ImageIO.write(javafx.embed.swing.SwingFXUtils.fromFXImage(img, null), "png",
          dir.resolve(name + ".png").toFile());
    } catch (java.io.IOException e) {
      throw new java.io.UncheckedIOException(e);
    }
    return c;
  }

  /** Luminance of the strip 9 px either side of the member, along its whole length. */
  private static int[] greyAround(Canvas c, FrameRef f) {
    PlaneGeometry geo = new PlaneGeometry(GRID, W, H, 52, 30);
    double[] s = geo.frame(f);
    PixelReader r = c.snapshot(null, null).getPixelReader();
    int x0 = (int) s[0];
    int x1 = (int) s[2];
    int y = (int) s[1];
    int[] out = new int[(x1 - x0 + 1) * 19];
    int k = 0;
    for (int x = x0; x <= x1; x++) {
      for (int dy = -9; dy <= 9; dy++) {
        out[k++] = luminance(r.getArgb(x, y + dy));
      }
    }
    return out;
  }

  private static int luminance(int argb) {
    int red = (argb >> 16) & 255;
    int green = (argb >> 8) & 255;
    int blue = argb & 255;
    return (int) Math.round(0.299 * red + 0.587 * green + 0.114 * blue);
  }

  private static long distance(int[] a, int[] b) {
    long d = 0;
    for (int i = 0; i < a.length; i++) {
      d += Math.abs(a[i] - b[i]);
    }
    return d;
  }

  /** Pixels whose grey differs by more than 60 within {@code pad} of the segment's box. */
  private static int regionDiff(Canvas a, Canvas b, int[] seg, int pad) {
    PixelReader ra = a.snapshot(null, null).getPixelReader();
    PixelReader rb = b.snapshot(null, null).getPixelReader();
    int n = 0;
    for (int y = Math.min(seg[1], seg[3]) - pad; y <= Math.max(seg[1], seg[3]) + pad; y++) {
      for (int x = Math.min(seg[0], seg[2]) - pad; x <= Math.max(seg[0], seg[2]) + pad; x++) {
        if (Math.abs(luminance(ra.getArgb(x, y)) - luminance(rb.getArgb(x, y))) > 60) {
          n++;
        }
      }
    }
    return n;
  }
}
