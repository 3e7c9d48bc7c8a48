package org.assay.accounts;

import java.time.Instant;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;

@Entity
@Table(name = "api_token")
class ApiTokenEntity {

	@Id
	@GeneratedValue(strategy = GenerationType.IDENTITY)
	private Long id;

	@Column(name = "user_id", nullable = false)
	private Long userId;

	@Column(nullable = false)
	private String name;

	@Column(name = "token_hash", nullable = false, unique = true)
	private String tokenHash;

	@Column(name = "created_at", nullable = false)
	private Instant createdAt;

	@Column(name = "last_used_at")
	private Instant lastUsedAt;

	@Column(name = "revoked_at")
	private Instant revokedAt;

	protected ApiTokenEntity() {
	}

	ApiTokenEntity(Long userId, String name, String tokenHash) {
		this.userId = userId;
		this.name = name;
		this.tokenHash = tokenHash;
		this.createdAt = Instant.now();
	}

	Long getId() {
		return this.id;
	}

	Long getUserId() {
		return this.userId;
	}

	String getName() {
		return this.name;
	}

	Instant getCreatedAt() {
		return this.createdAt;
	}

	boolean isRevoked() {
		return this.revokedAt != null;
	}

	void revoke() {
		this.revokedAt = Instant.now();
	}

}
