package org.bracewalk.app;

import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.port.DesignRepository;
import org.bracewalk.core.port.InspectionRepository;
import org.bracewalk.core.port.IssuedReportRepository;
import org.bracewalk.core.port.ObservationRepository;
import org.bracewalk.core.port.PlaneRepository;
import org.bracewalk.core.port.RecordStore;
import org.bracewalk.core.port.RepairRepository;
import org.bracewalk.core.port.SiteRepository;
import org.bracewalk.core.port.StoreException;
import org.bracewalk.core.port.StructureRepository;

/** A store whose observation writes fail after a given number: a disk that fills up. */
final class FailingStore implements RecordStore {
  private final RecordStore inner;
  private final int allowed;
  private int added;

  FailingStore(RecordStore inner, int allowed) {
    this.inner = inner;
    this.allowed = allowed;
  }

  int observationsAdded() {
    return added;
  }

  @Override
  public org.bracewalk.core.port.GlobalIdentities identities() {
    return inner.identities();
  }

  @Override
  public ObservationRepository observations() {
    ObservationRepository o = inner.observations();
    return new ObservationRepository() {
      @Override
      public Observation add(Observation observation) {
        if (added >= allowed) {
          throw new StoreException("disk full (simulated)");
        }
        added++;
        return o.add(observation);
      }

      @Override
      public Optional<Observation> find(long id) {
        return o.find(id);
      }

      @Override
      public List<Observation> ofInspection(long inspectionId) {
        return o.ofInspection(inspectionId);
      }

      @Override
      public Photo addPhoto(Photo photo) {
        return o.addPhoto(photo);
      }

      @Override
      public List<Photo> photosOf(long observationId) {
        return o.photosOf(observationId);
      }

      @Override
      public List<Long> withPhotos(long inspectionId) {
        return o.withPhotos(inspectionId);
      }

      @Override
      public java.util.Map<Integer, Long> recordedFrom(long inspectionId, String sourceSha256) {
        return o.recordedFrom(inspectionId, sourceSha256);
      }

      @Override
      public void addSource(long inspectionId, String sourceSha256, int line, long observationId) {
        o.addSource(inspectionId, sourceSha256, line, observationId);
      }
    };
  }

  @Override
  public SiteRepository sites() {
    return inner.sites();
  }

  @Override
  public StructureRepository structures() {
    return inner.structures();
  }

  @Override
  public PlaneRepository planes() {
    return inner.planes();
  }

  @Override
  public DesignRepository designs() {
    return inner.designs();
  }

  @Override
  public InspectionRepository inspections() {
    return inner.inspections();
  }

  @Override
  public RepairRepository repairs() {
    return inner.repairs();
  }

  @Override
  public IssuedReportRepository issuedReports() {
    return inner.issuedReports();
  }

  @Override
  public <T> T inTransaction(Work<T> work) {
    return inner.inTransaction(work);
  }

  @Override
  public String location() {
    return inner.location();
  }

  @Override
  public void close() {
    inner.close();
  }
}
